const STATES: Record<string, { label: string; icon: string; cls: string }> = {
  draft: { label: 'Draft', icon: '✎', cls: 'text-state-draft border-state-draft/40 bg-white' },
  in_review: { label: 'In review', icon: '◔', cls: 'text-state-review border-state-review/40 bg-warn-bg' },
  signed_off: { label: 'Signed off', icon: '✔', cls: 'text-state-signed border-state-signed/40 bg-good-bg' },
  returned: { label: 'Returned', icon: '↩', cls: 'text-state-returned border-state-returned/40 bg-bad-bg' },
};

/** A panel's sign-off state: colour always with a word and a symbol. */
export function SignOffState({ state }: { state: string }) {
  const s = STATES[state] ?? STATES.draft;
  return (
    <span data-state={state} className={`inline-flex items-center gap-1 rounded-sm border px-1.5 py-0.5 text-xs font-semibold ${s.cls}`}>
      <span aria-hidden>{s.icon}</span>
      {s.label}
    </span>
  );
}

export function Verdict({ ok, okText, badText }: { ok: boolean; okText: string; badText: string }) {
  return ok ? (
    <span className="inline-flex items-center gap-1 text-sm font-semibold text-state-signed">✔ {okText}</span>
  ) : (
    <span className="inline-flex items-center gap-1 text-sm font-semibold text-state-returned">✖ {badText}</span>
  );
}
