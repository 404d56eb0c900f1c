import { STEP_FIELDS, STEPS, type FieldMessages } from './steps';

/** The wizard's steps, in order: the current one marked, a ⚠ beside each step with an error. */
export function StepNav({ step, errors, onStep }: { step: number; errors: FieldMessages; onStep: (step: number) => void }) {
  return (
    <ol className="flex gap-1 text-sm" aria-label="Steps">
      {STEPS.map((s, i) => (
        <li key={s}>
          <button
            type="button"
            aria-current={i === step ? 'step' : undefined}
            onClick={() => onStep(i)}
            className={`rounded px-2 py-1 font-semibold ${i === step ? 'bg-header text-white' : 'text-ink-soft hover:bg-copper-50'}`}
          >
            {i + 1}. {s}
            {STEP_FIELDS[s].some((f) => errors[f]) ? <span className="ml-1 text-state-returned">⚠</span> : null}
          </button>
        </li>
      ))}
    </ol>
  );
}
