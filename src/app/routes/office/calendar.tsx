import { officeRoles } from '@shared/workflow/roles';
import { RequireRole } from '@/app/layout/require-role';
import { PageHeader, Panel } from '@/components/ui/panel';
import { paths } from '@/config/paths';
import { SiteCalendar } from '@/features/calendar/components/site-calendar';

export function Component() {
  return (
    <RequireRole roles={officeRoles}>
      <PageHeader
        title="Calendar"
        lead="Site visits the office has booked and the days the crews plan to build. Open an entry to move or call it off."
      />
      <Panel>
        <SiteCalendar hrefFor={(id) => paths.office.request.getHref(id)} />
      </Panel>
    </RequireRole>
  );
}
