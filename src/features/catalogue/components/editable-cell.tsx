import { useEffect, useRef, useState } from 'react';

/**
 * A number shown as text that turns into an input on click (or Enter); Enter or leaving the field saves,
 * Escape cancels. Used for inline edits of prices, hours and lead times.
 */
export function EditableNumber({
  value,
  label,
  onSave,
  format = (n) => String(n),
  step = 'any',
  integer = false,
  disabled = false,
}: {
  value: number;
  label: string;
  onSave: (n: number) => void;
  format?: (n: number) => string;
  step?: string;
  integer?: boolean;
  disabled?: boolean;
}) {
  const [editing, setEditing] = useState(false);
  const [text, setText] = useState(String(value));
  const [problem, setProblem] = useState<string | null>(null);
  const input = useRef<HTMLInputElement>(null);
  useEffect(() => {
    if (editing) input.current?.select();
  }, [editing]);
  if (!editing) {
    return (
      <button
        type="button"
        disabled={disabled}
        aria-label={`${label}: ${format(value)}. Edit`}
        className="w-full rounded px-1 text-right tabular-nums hover:bg-copper-50 focus:bg-copper-50 disabled:hover:bg-transparent"
        onClick={() => {
          setText(String(value));
          setProblem(null);
          setEditing(true);
        }}
      >
        {format(value)}
      </button>
    );
  }
  const commit = () => {
    const n = Number(text.trim());
    if (text.trim() === '' || !Number.isFinite(n) || n < 0 || (integer && !Number.isInteger(n))) {
      setProblem(integer ? 'a whole number ≥ 0' : 'a number ≥ 0');
      return;
    }
    setEditing(false);
    if (n !== value) onSave(n);
  };
  return (
    <span className="inline-flex flex-col items-end">
      <input
        ref={input}
        aria-label={label}
        aria-invalid={!!problem}
        inputMode="decimal"
        step={step}
        className="w-20 rounded border border-copper-500 bg-panel px-1 py-0.5 text-right text-sm aria-[invalid=true]:border-state-returned"
        value={text}
        onChange={(e) => setText(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => {
          if (e.key === 'Enter') commit();
          if (e.key === 'Escape') setEditing(false);
        }}
      />
      {problem ? <span className="text-xs text-state-returned">⚠ {problem}</span> : null}
    </span>
  );
}

export const hoursFmt = (n: number) => n.toLocaleString('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 3 });
