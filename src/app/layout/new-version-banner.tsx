import { useSyncExternalStore } from 'react';
import { Button } from '@/components/ui/button';
import { newVersionReady } from '@/lib/service-worker';

/** A newer build is installed and waits: the person reloads onto it when nothing is half typed. */
export function NewVersionBanner() {
  const ready = useSyncExternalStore(newVersionReady.subscribe, newVersionReady.get);
  if (!ready) return null;
  return (
    <div
      role="status"
      className="no-print mb-4 flex flex-wrap items-center gap-3 rounded-md border border-pine-200 bg-pine-50 px-4 py-2 text-sm"
    >
      <span>A newer version of Gradepass is ready.</span>
      <Button variant="secondary" onClick={() => void newVersionReady.reloadOntoIt()}>
        Reload to use it
      </Button>
    </div>
  );
}
