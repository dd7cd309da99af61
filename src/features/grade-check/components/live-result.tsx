import { headwaterWords } from '@shared/charts/check-words';
import type { RuleProfile } from '@shared/engine';
import { Notice } from '@/components/ui/notice';
import type { LiveCheck } from '../lib/use-live-check';
import { FindingsTable } from './findings-table';
import { ProfileChartView } from './profile-chart-view';

/** The live verdict, chart and findings for the survey as typed. */
export function LiveResult({ live, rules }: { live: LiveCheck; rules: RuleProfile }) {
  if (!live.results || !live.inputs) {
    const count = Object.keys(live.errors).length;
    return (
      <Notice tone="warn" title="Not checked yet">
        {count > 0
          ? `${count} ${count === 1 ? 'box needs' : 'boxes need'} attention before the check can run.`
          : 'Enter the centreline to see the check.'}
      </Notice>
    );
  }
  const { report } = live.results;
  const left = Object.keys(live.errors).length;
  return (
    <div className="space-y-4">
      {left > 0 && (
        <Notice tone="warn" title={`${left} ${left === 1 ? 'box needs' : 'boxes need'} attention before saving`}>
          The check below leaves those parts out until they read cleanly.
        </Notice>
      )}
      <div data-testid="live-verdict" data-passes={report.passes}>
        <Notice
          tone={report.passes ? 'info' : 'error'}
          title={
            report.passes
              ? 'Meets the rules checked'
              : `Fails ${report.summary.fail} ${report.summary.fail === 1 ? 'rule' : 'rules'}`
          }
        >
          {report.summary.text}
        </Notice>
      </div>
      {report.culvert && headwaterWords(report.culvert) && (
        <p data-testid="culvert-headwater" className="text-sm">
          {headwaterWords(report.culvert)}
        </p>
      )}
      <ProfileChartView inputs={live.inputs} results={live.results} rules={rules} />
      <FindingsTable findings={report.findings} units={rules.units} />
    </div>
  );
}
