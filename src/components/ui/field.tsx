import { useId, type ReactNode } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';

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

/** One choice of a select: its value and the text shown. */
export type SelectOption = readonly [value: string | number, text: string];

/** A labelled select (see Field) over `options`; `notGiven` adds a first option of value '' with that text. */
export function SelectField({
  label,
  unit,
  error,
  hint,
  field,
  notGiven,
  options,
}: {
  label: string;
  unit?: string;
  error?: string;
  hint?: string;
  /** the form registration of the select, e.g. register('duty') */
  field: UseFormRegisterReturn;
  notGiven?: string;
  options: readonly SelectOption[];
}) {
  return (
    <Field label={label} unit={unit} error={error} hint={hint}>
      {(a) => (
        <select {...a} {...field} className={inputClass}>
          {notGiven !== undefined ? <option value="">{notGiven}</option> : null}
          {options.map(([value, text]) => (
            <option key={value} value={value}>
              {text}
            </option>
          ))}
        </select>
      )}
    </Field>
  );
}
