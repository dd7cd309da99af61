import { useState, type ReactNode } from 'react';
import { Button } from '@/components/ui/button';
import { ErrorNotice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { ApiError } from '@/lib/api-client';
import type { GradeCheckRequestHeader, GradeCheckView } from '@shared/contracts/grade-checks';
import type { RuleProfile } from '@shared/engine';
import type { GradeCheckDraftView } from '@shared/contracts/grade-checks';
import { formatMoment } from '@shared/format/when';
import { useDiscardGradeCheckDraft } from '../api/discard-grade-check-draft';
import { useSaveGradeCheck } from '../api/save-grade-check';
import { surveyFromDraft } from '../lib/survey-draft';
import { useDraftAutosave, type DraftState } from '../lib/use-draft-autosave';
import { LeaveSurveyGuard } from './leave-survey-guard';
import { surveyFromInputs } from '../lib/survey-from-inputs';
import { initialSurvey, type SurveyState } from '../lib/survey-state';
import { useLiveCheck } from '../lib/use-live-check';
import { ApronFields } from './apron-fields';
import { ApronPanel } from './apron-panel';
import { CentrelineTable } from './centreline-table';
import { CulvertFields } from './culvert-fields';
import { GeometryFields } from './geometry-fields';
import { LaserPanel } from './laser-panel';
import { LiveResult } from './live-result';
import { PlanFields } from './plan-fields';
import { PlanViewPanel } from './plan-view-panel';
import { ProposalPanel } from './proposal-panel';
import { RoadFields } from './road-fields';
import { StakesEditor } from './stakes-editor';

/** The rule profile the check is made against, chosen by the screen's picker. */
export interface ChosenRuleProfile {
  picker: ReactNode;
  versionId: string | null;
  rules: RuleProfile | undefined;
  loadingRules: boolean;
  /** Take up the version a survey was checked against. */
  choose: (versionId: string) => void;
}

/** Whether the typing is kept on the server, and a way to start the survey over. */
function DraftLine({
  state,
  restored,
  onStartOver,
}: {
  state: DraftState;
  restored: boolean;
  onStartOver: () => void;
}) {
  const words =
    state.kind === 'waiting'
      ? 'Keeping your draft…'
      : state.kind === 'failed'
        ? `Your draft could not be kept: ${state.error instanceof Error ? state.error.message : 'no answer'}. It is tried again as you type.`
        : state.at
          ? `${restored ? 'Your draft is back, as' : 'Draft'} kept ${formatMoment(state.at)}.`
          : 'What you type is kept as your draft until you save it as a check.';
  return (
    <div className="flex flex-wrap items-center justify-between gap-2 text-sm">
      <p role="status" className={state.kind === 'failed' ? 'font-semibold text-red-900' : 'text-stone-600'}>
        {words}
      </p>
      <Button variant="quiet" onClick={onStartOver}>
        Start the survey over
      </Button>
    </div>
  );
}

/** Survey entry on the left, the live check on the right; saving asks the server to run and keep the check. */
export function GradeCheckWorkspace({
  request,
  checks,
  ruleProfile,
  draft,
}: {
  request: GradeCheckRequestHeader;
  checks: GradeCheckView[];
  ruleProfile: ChosenRuleProfile;
  /** The caller's survey draft, read once when the screen opened. */
  draft: GradeCheckDraftView | null;
}) {
  const speedMph = request.application.site?.postedSpeedMph;
  const [survey, setSurvey] = useState<SurveyState>(() =>
    draft ? surveyFromDraft(draft.survey, speedMph) : initialSurvey(speedMph),
  );
  const { rules, versionId } = ruleProfile;
  const live = useLiveCheck(survey, rules);
  const save = useSaveGradeCheck(request.id);
  const discard = useDiscardGradeCheckDraft();
  const autosave = useDraftAutosave({
    requestId: request.id,
    survey,
    versionId,
    keptAt: draft ? new Date(draft.updatedAt) : null,
  });
  const startOver = async () => {
    const fresh = initialSurvey(speedMph);
    setSurvey(fresh);
    autosave.setBaseline(fresh);
    save.reset();
    await autosave.settle();
    discard.mutate(request.id);
  };
  const saveCheck = async () => {
    if (!live.inputs || !versionId) return;
    const saving = survey;
    // A draft still on its way must land before the check, whose save removes it.
    await autosave.settle();
    save.mutate(
      { requestId: request.id, ruleProfileVersionId: versionId, inputs: live.inputs },
      { onSuccess: () => autosave.setBaseline(saving) },
    );
  };

  const update =
    <K extends keyof SurveyState>(part: K) =>
    (patch: Partial<SurveyState[K]>) =>
      setSurvey((s) => ({
        ...s,
        [part]: { ...s[part], ...patch },
        // A design applied to other ground no longer fits once the ground changes.
        design:
          part === 'centreline'
            ? { ...s.design, applied: null }
            : part === 'design'
              ? { ...s.design, ...patch }
              : s.design,
      }));
  // The server's 400 names the inputs' boxes by the same paths the live check does.
  const serverFields = save.error instanceof ApiError ? save.error.fields : {};
  const errors = { ...serverFields, ...live.errors };

  return (
    <div className="grid grid-cols-[minmax(0,1fr)] gap-6 xl:grid-cols-[minmax(0,5fr)_minmax(0,6fr)]">
      <LeaveSurveyGuard changed={autosave.changed} draft={autosave.state} settle={autosave.settle} />
      <div className="space-y-6">
        <DraftLine state={autosave.state} restored={Boolean(draft)} onStartOver={() => void startOver()} />
        <ErrorNotice error={discard.error} />
        <Panel title="Rule profile">
          {ruleProfile.picker}
          {checks.length > 0 && (
            <div className="mt-4 flex flex-wrap gap-2">
              <span className="self-center text-sm text-stone-600">Survey again from</span>
              {checks.map((c) => (
                <Button
                  key={c.id}
                  variant="secondary"
                  onClick={() => {
                    setSurvey(surveyFromInputs(c.inputs));
                    ruleProfile.choose(c.ruleProfileVersionId);
                    save.reset();
                  }}
                >
                  check {c.number}
                </Button>
              ))}
            </div>
          )}
        </Panel>
        <Panel title="The road">
          <RoadFields road={survey.road} errors={errors} onChange={update('road')} />
        </Panel>
        <Panel title="The centreline">
          <CentrelineTable centreline={survey.centreline} errors={errors} onChange={update('centreline')} />
        </Panel>
        <Panel title="Culvert">
          <CulvertFields culvert={survey.culvert} errors={errors} onChange={update('culvert')} />
        </Panel>
        <Panel title="Geometry">
          <GeometryFields geometry={survey.geometry} errors={errors} onChange={update('geometry')} />
        </Panel>
        <Panel title="Plan view extras">
          <PlanFields plan={survey.plan} errors={errors} onChange={update('plan')} />
        </Panel>
        <Panel title="Entrance edges">
          <ApronFields apron={survey.apron} errors={errors} onChange={update('apron')} />
        </Panel>
        <Panel title="Laser and stakes">
          <StakesEditor laser={survey.laser} errors={errors} onChange={update('laser')} />
        </Panel>
      </div>
      <div className="space-y-6">
        <Panel
          title="Live check"
          actions={
            <Button disabled={!live.ready || !versionId || save.isPending} onClick={() => void saveCheck()}>
              {save.isPending ? 'Saving…' : 'Save this check'}
            </Button>
          }
        >
          {save.isSuccess && (
            <p role="status" className="mb-3 text-sm font-semibold text-pine-800">
              Saved as check {save.data.check.number}.
            </p>
          )}
          <ErrorNotice error={save.error} />
          {!rules ? (
            <p className="text-sm text-stone-600">
              {ruleProfile.loadingRules ? 'Loading the rule profile…' : 'Choose the rule profile to check against.'}
            </p>
          ) : (
            <LiveResult live={live} rules={rules} />
          )}
        </Panel>
        {rules && live.inputs && live.results && (
          <Panel title="Plan view">
            <PlanViewPanel inputs={live.inputs} results={live.results} roadName={request.roadName} />
          </Panel>
        )}
        {rules && (
          <Panel title="Compliant profile">
            <ProposalPanel
              proposal={live.results?.proposal}
              designing={live.designing}
              requested={survey.design.proposed}
              applied={Boolean(survey.design.applied)}
              haul={{ soil: survey.design.soil, truckCuYd: Number(survey.design.truckCuYd) || 10 }}
              onSuggest={() => update('design')({ proposed: true })}
              onApply={(p) => update('design')({ applied: p.profile })}
              onUndo={() => update('design')({ applied: null })}
            />
          </Panel>
        )}
        {rules && (
          <Panel title="Warp stakes for the entrance edges">
            <ApronPanel apron={live.results?.report.apron} />
          </Panel>
        )}
        {rules && (
          <Panel title="Laser settings for the crew">
            <LaserPanel laser={live.results?.laser} />
          </Panel>
        )}
      </div>
    </div>
  );
}
