import { useId, type ReactNode } from 'react';

export const inputClass =
  'w-full rounded border border-line bg-panel px-2 py-1.5 text-sm text-ink placeholder:text-ink-soft/60 focus:border-copper-500 aria-[invalid=true]:border-state-returned';

/** A labelled form field with its hint and error message; the child receives id and aria props. */
export function Field({
  label,
  error,
  hint,
  children,
  unit,
}: {
  label: string;
  error?: string;
  hint?: string;
  unit?: string;
  children: (props: { id: string; 'aria-invalid': boolean; 'aria-describedby'?: string }) => ReactNode;
}) {
  const id = useId();
  const msgId = `${id}-msg`;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-xs font-semibold tracking-wide text-ink-soft uppercase">
        {label}
        {unit ? <span className="ml-1 font-normal normal-case">({unit})</span> : null}
      </label>
      {children({ id, 'aria-invalid': !!error, 'aria-describedby': error || hint ? msgId : undefined })}
      {error ? (
        <p id={msgId} role="alert" className="text-xs text-state-returned">
          ⚠ {error}
        </p>
      ) : hint ? (
        <p id={msgId} className="text-xs text-ink-soft">
          {hint}
        </p>
      ) : null}
    </div>
  );
}
