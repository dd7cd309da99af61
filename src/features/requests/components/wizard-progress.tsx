export const wizardSteps = ['The property and the road', 'The entrance you want', 'Photos', 'Review and send'] as const;

/** Where the person is in the form; the current step is announced to screen readers. */
export function WizardProgress({ step }: { step: number }) {
  return (
    <ol className="mb-6 grid gap-2 sm:grid-cols-4" aria-label="Steps">
      {wizardSteps.map((title, index) => {
        const state = index < step ? 'done' : index === step ? 'current' : 'ahead';
        return (
          <li
            key={title}
            aria-current={state === 'current' ? 'step' : undefined}
            className={`rounded-md border-l-4 px-3 py-2 text-sm ${state === 'current' ? 'border-tape bg-white font-semibold text-pine-900 shadow-sm' : state === 'done' ? 'border-pine-500 text-pine-800' : 'border-stone-200 text-stone-600'}`}
          >
            <span className="block text-xs uppercase tracking-wide">
              Step {index + 1}
              {state === 'done' ? ' · saved' : ''}
            </span>
            {title}
          </li>
        );
      })}
    </ol>
  );
}
