import { useId, useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';

/** Markup and labour rate of the panel (the estimator's two numbers). */
/** `lockedBecause`: why the two numbers cannot be changed now (shown beside them), or null when they can. */
export function PricingForm({
  markupPercent,
  labourRate,
  lockedBecause,
  pending,
  onSave,
}: {
  markupPercent: number;
  labourRate: number;
  lockedBecause: string | null;
  pending: boolean;
  onSave: (v: { markupPercent: number; labourRate: number }) => void;
}) {
  const disabled = lockedBecause !== null;
  const reasonId = useId();
  const [markup, setMarkup] = useState(String(markupPercent));
  const [rate, setRate] = useState(String(labourRate));
  const [problem, setProblem] = useState<string | null>(null);
  const changed = Number(markup) !== markupPercent || Number(rate) !== labourRate;
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const m = Number(markup);
    const r = Number(rate);
    if (markup.trim() === '' || !(m >= 0 && m <= 300)) return setProblem('Markup 0–300 %');
    if (rate.trim() === '' || !(r >= 0 && r <= 1000)) return setProblem('Labour rate 0–1000 per hour');
    setProblem(null);
    onSave({ markupPercent: m, labourRate: r });
  };
  return (
    <form onSubmit={submit} aria-label="Pricing" className="flex flex-wrap items-end gap-3">
      <label className="flex flex-col text-xs font-semibold uppercase tracking-wide text-ink-soft">
        Labour rate ($/h)
        <input
          disabled={disabled}
          aria-describedby={disabled ? reasonId : undefined}
          value={rate}
          onChange={(e) => setRate(e.target.value)}
          inputMode="decimal"
          className="w-24 rounded border border-line bg-panel px-2 py-1 text-right text-sm font-normal text-ink"
        />
      </label>
      <label className="flex flex-col text-xs font-semibold uppercase tracking-wide text-ink-soft">
        Markup (%)
        <input
          disabled={disabled}
          aria-describedby={disabled ? reasonId : undefined}
          value={markup}
          onChange={(e) => setMarkup(e.target.value)}
          inputMode="decimal"
          className="w-20 rounded border border-line bg-panel px-2 py-1 text-right text-sm font-normal text-ink"
        />
      </label>
      {!disabled ? (
        <Button
          type="submit"
          variant="secondary"
          disabled={!changed || pending}
          waitsFor={pending ? 'Saving…' : 'Change the rate or the markup to save'}
          quiet={!pending}
        >
          Save pricing
        </Button>
      ) : (
        <span id={reasonId} className="max-w-56 text-xs text-ink-soft">
          <span aria-hidden>◔ </span>
          {lockedBecause}
        </span>
      )}
      {problem ? (
        <span role="alert" className="text-xs text-state-returned">
          ⚠ {problem}
        </span>
      ) : null}
    </form>
  );
}
