import { useQueryClient } from '@tanstack/react-query';
import { type ComponentType, useCallback, useEffect, useRef, useState } from 'react';
import { Link } from 'react-router';
import type { EntranceStep, SiteStep } from '@shared/requests/application-schema';
import { Button } from '@/components/ui/button';
import { ErrorNotice, Loading, Notice } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { ApiError } from '@/lib/api-client';
import { getRequestQueryOptions, useRequest } from '../api/get-request';
import { useRunTransition } from '@/lib/status-change';
import { saveDraftOnExit, sendExitCopy, useSaveDraft } from '../api/save-draft';
import type { RequestView } from '@shared/contracts/requests';
import { ApplicationSummary } from './application-summary';
import { EntranceStepForm } from './entrance-step';
import { answeredOnly, fieldsByStep, type StepSnapshot } from './form-helpers';
import { SiteStepForm } from './site-step';
import { StepButtons } from './step-buttons';
import { WizardProgress, wizardSteps } from './wizard-progress';

export interface PhotoSlotProps {
  requestId: string;
  readOnly: boolean;
  /** A photo's GPS position, offered as the site position; saved as coordinates when the person accepts. */
  onUsePosition: (lat: number, lng: number) => Promise<void>;
  /** The owner's no to that offer, kept with the answers so it is not asked again. */
  onDeclinePosition: () => Promise<void>;
  /** The site position already given, if any: a photo's position is offered only while there is none. */
  position: { lat: number; lng: number } | null;
  positionDeclined: boolean;
}

interface WizardProps {
  requestId: string;
  /** The photos step comes from the photos feature; the route module passes it in. */
  Photos: ComponentType<PhotoSlotProps>;
  onSent: (requestId: string) => void;
  requestHref: string;
}

export function RequestWizard({ requestId, ...rest }: WizardProps) {
  const { data, error, isPending } = useRequest(requestId);
  const restoring = useExitCopy(requestId);
  if (isPending || restoring) return <Loading />;
  if (error) return <ErrorNotice error={error} />;
  const { request } = data;
  if (request.status !== 'draft' && request.status !== 'needs_details') {
    return (
      <Notice title={`This request is “${request.statusLabel}”`}>
        Its answers can no longer be changed here.{' '}
        <Link className="underline" to={rest.requestHref}>
          Open the request
        </Link>{' '}
        to follow it or write to the office.
      </Notice>
    );
  }
  return <WizardBody key={request.id} request={request} {...rest} />;
}

/** Answers a reloaded page kept in this tab are sent before the form opens, so the form shows them. */
function useExitCopy(requestId: string) {
  const queryClient = useQueryClient();
  const [restoring, setRestoring] = useState(true);
  useEffect(() => {
    let live = true;
    void sendExitCopy(requestId)
      .then((sent) =>
        sent ? queryClient.refetchQueries({ queryKey: getRequestQueryOptions(requestId).queryKey }) : undefined,
      )
      .finally(() => {
        if (live) setRestoring(false);
      });
    return () => {
      live = false;
    };
  }, [requestId, queryClient]);
  return restoring;
}

function WizardBody({ request, Photos, onSent }: Omit<WizardProps, 'requestId'> & { request: RequestView }) {
  const queryClient = useQueryClient();
  const [step, setStep] = useState(Math.min(Math.max(request.wizardStep, 0), 3));
  const [serverFields, setServerFields] = useState<ReturnType<typeof fieldsByStep>>(null);
  const [problem, setProblem] = useState<unknown>(null);
  const [reloads, setReloads] = useState(0);
  const version = useRef(request.version);
  const snapshot = useRef<(() => StepSnapshot) | null>(null);
  const keepSnapshot = useCallback((read: () => StepSnapshot) => {
    snapshot.current = read;
  }, []);
  const heading = useRef<HTMLHeadingElement>(null);
  const firstRender = useRef(true);
  const hasServerFields = useRef(false);
  useEffect(() => {
    hasServerFields.current = serverFields !== null;
  });
  const save = useSaveDraft();
  const { mutate: saveQuietly } = save;
  const transition = useRunTransition(request.id);
  const busy = save.isPending || transition.isPending;

  useEffect(() => {
    if (firstRender.current) {
      firstRender.current = false;
      return;
    }
    // A step opened to show the server's objections puts focus on the first of them instead.
    if (!hasServerFields.current) heading.current?.focus();
  }, [step]);

  // Unsaved answers are kept when the person leaves: a normal save when they move elsewhere in the app,
  // a keepalive one when the tab closes or reloads.
  useEffect(() => {
    const pending = () => {
      const snap = snapshot.current?.();
      const key = step === 0 ? 'site' : step === 1 ? 'entrance' : null;
      return snap?.dirty && key
        ? { id: request.id, expectedVersion: version.current, [key]: answeredOnly(snap.values) }
        : null;
    };
    const onPageHide = () => {
      const change = pending();
      if (change) saveDraftOnExit(change);
    };
    window.addEventListener('pagehide', onPageHide);
    return () => {
      window.removeEventListener('pagehide', onPageHide);
      const change = pending();
      if (change) saveQuietly(change);
    };
  }, [step, request.id, saveQuietly]);

  async function persist(
    change: { site?: SiteStep | Partial<SiteStep>; entrance?: EntranceStep | Partial<EntranceStep> },
    nextStep: number,
  ) {
    setProblem(null);
    try {
      const saved = await saveKeepingScreen({ id: request.id, wizardStep: nextStep, ...change });
      version.current = saved.request.version;
      snapshot.current = null;
      setServerFields(null);
      setStep(nextStep);
    } catch (error) {
      const fields = fieldsByStep(error);
      if (fields) setServerFields(fields);
      else await showConflict(error);
    }
  }

  // The person's own last save from a closing tab can land after the page reloaded, so the version moved on
  // by their own hand: what is on screen now is their latest word, and it is saved over it once.
  async function saveKeepingScreen(change: Omit<Parameters<typeof save.mutateAsync>[0], 'expectedVersion'>) {
    try {
      return await save.mutateAsync({ ...change, expectedVersion: version.current });
    } catch (error) {
      if (!(error instanceof ApiError && error.status === 409)) throw error;
      const fresh = await queryClient.fetchQuery({ ...getRequestQueryOptions(request.id), staleTime: 0 });
      if (fresh.request.status !== 'draft' && fresh.request.status !== 'needs_details') throw error;
      version.current = fresh.request.version;
      return save.mutateAsync({ ...change, expectedVersion: version.current });
    }
  }

  async function showConflict(error: unknown) {
    setProblem(error);
    if (error instanceof ApiError && error.status === 409) {
      const fresh = await queryClient.fetchQuery({ ...getRequestQueryOptions(request.id), staleTime: 0 });
      version.current = fresh.request.version;
      setReloads((n) => n + 1);
    }
  }

  async function send() {
    setProblem(null);
    // Changed answers during "more details needed" are already saved; the reply itself is sent from the request page.
    if (request.status === 'needs_details') return onSent(request.id);
    try {
      await transition.mutateAsync({ action: 'submit', expectedVersion: version.current });
      onSent(request.id);
    } catch (error) {
      const fields = fieldsByStep(error);
      if (!fields) return showConflict(error);
      setServerFields(fields);
      setStep(Object.keys(fields.site).length > 0 ? 0 : 1);
    }
  }

  const latest = queryClient.getQueryData(getRequestQueryOptions(request.id).queryKey)?.request ?? request;
  const usePosition = async (lat: number, lng: number) => {
    const site = { ...latest.application.site, positionKind: 'coordinates' as const, siteLat: lat, siteLng: lng };
    const saved = await saveKeepingScreen({ id: request.id, site });
    version.current = saved.request.version;
  };
  const declinePosition = async () => {
    const site = { ...latest.application.site, photoPositionDeclined: true };
    const saved = await saveKeepingScreen({ id: request.id, site });
    version.current = saved.request.version;
  };
  const givenSite = latest.application.site;
  const position =
    givenSite?.positionKind === 'coordinates' &&
    typeof givenSite.siteLat === 'number' &&
    typeof givenSite.siteLng === 'number'
      ? { lat: givenSite.siteLat, lng: givenSite.siteLng }
      : null;
  const photoPosition = {
    onUsePosition: usePosition,
    onDeclinePosition: declinePosition,
    position,
    positionDeclined: givenSite?.photoPositionDeclined === true,
  };
  const stepKey = `${step}-${reloads}`;

  return (
    <div>
      <WizardProgress step={step} />
      <Panel>
        <h2 ref={heading} tabIndex={-1} className="mb-4 text-xl font-bold text-pine-900 outline-none">
          Step {step + 1} of 4: {wizardSteps[step]}
        </h2>
        {problem !== null && (
          <div className="mb-4">
            <ErrorNotice error={problem} />
          </div>
        )}
        {step === 0 && (
          <SiteStepForm
            key={stepKey}
            initial={latest.application.site ?? {}}
            serverFields={serverFields?.site}
            saving={busy}
            keepSnapshot={keepSnapshot}
            onNext={(site) => persist({ site }, 1)}
          />
        )}
        {step === 1 && (
          <EntranceStepForm
            key={stepKey}
            initial={latest.application.entrance ?? {}}
            serverFields={serverFields?.entrance}
            saving={busy}
            keepSnapshot={keepSnapshot}
            onNext={(entrance) => persist({ entrance }, 2)}
            onBack={(entrance) => persist({ entrance: answeredOnly(entrance) }, 0)}
          />
        )}
        {step === 2 && (
          <form
            noValidate
            onSubmit={(e) => {
              e.preventDefault();
              void persist({}, 3);
            }}
            className="space-y-5"
            aria-label="Photos"
          >
            <Photos requestId={request.id} readOnly={false} {...photoPosition} />
            <StepButtons saving={busy} onBack={() => void persist({}, 1)} />
          </form>
        )}
        {step === 3 && (
          <div className="space-y-6">
            <ApplicationSummary application={latest.application} />
            <Photos requestId={request.id} readOnly {...photoPosition} />
            <p className="text-sm text-stone-600">
              {request.status === 'needs_details'
                ? 'Your changes are saved. Answer the office’s question on the request page to send it back to them.'
                : 'When you send it, the office gets your request and you get a receipt by e-mail. You can still withdraw it later.'}
            </p>
            <div className="flex flex-wrap gap-3 border-t border-stone-200 pt-4">
              <Button variant="secondary" onClick={() => void persist({}, 2)} disabled={busy}>
                Back
              </Button>
              <Button onClick={() => void send()} disabled={busy}>
                {transition.isPending
                  ? 'Sending…'
                  : request.status === 'needs_details'
                    ? 'Done: back to the request'
                    : 'Send to the office'}
              </Button>
            </div>
          </div>
        )}
      </Panel>
    </div>
  );
}
