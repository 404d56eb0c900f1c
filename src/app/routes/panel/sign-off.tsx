import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { Link, useParams } from 'react-router-dom';
import { panelQueries, usePanelAction } from '../../../features/panels/api/panels';
import { hasRole, sessionQueries } from '../../../features/auth/api/session';
import { SignOffState } from '../../../components/ui/status';
import { Button } from '../../../components/ui/button';
import { Caution, ErrorNote } from '../../../components/ui/feedback';
import { inputClass } from '../../../components/ui/field';
import { ApiError, get } from '../../../lib/api-client';
import type { SignOffEligibility } from '../../../../shared/schemas/panel';
import { checkQueries } from '../../../features/checks/api/checks';
import { ChangeReport } from '../../../features/panels/components/change-report';
import { LimitingParts, lineLink } from '../../../features/bom/components/limiting-parts';
import { bomQueries } from '../../../features/bom/api/bom';
import { bucketLabel, categoryLabel } from '../../../features/bom/components/format';
import { OVERRIDE_FIELDS } from '../../../../shared/schemas/override';

/** The shortest reason an engineer gives when signing off below the available fault current (the server holds the same). */
const MIN_REASON = 15;

export function Component() {
  const panelId = Number(useParams().panelId);
  const { data: p } = useQuery(panelQueries.detail(panelId));
  const { data: me } = useQuery(sessionQueries.me());
  const act = usePanelAction(panelId);
  const [comment, setComment] = useState('');
  const [acknowledged, setAcknowledged] = useState(false);
  const reviewing = p?.status === 'in_review' && hasRole(me, 'engineer');
  const checks = useQuery({ ...checkQueries.panel(panelId), enabled: reviewing });
  const bom = useQuery({ ...bomQueries.panel(panelId), enabled: reviewing });
  // separation of duties: the server refuses a sign-off by someone who submitted or changed the panel
  const own = useQuery({
    queryKey: [...panelQueries.detail(panelId).queryKey, 'sign-off-eligibility', p?.version],
    queryFn: () => get<SignOffEligibility>(`/api/panels/${panelId}/sign-off-eligibility`),
    enabled: reviewing,
  });
  const selfRefused = own.data?.reason ?? null;
  const revs = p?.revisions ?? [];
  const [from, setFrom] = useState<number | null>(null);
  const [to, setTo] = useState<number | null>(null);
  if (!p) return null;
  const isDesigner = hasRole(me, 'designer', 'admin');
  const isEngineer = hasRole(me, 'engineer');
  const canSubmit = isDesigner && (p.status === 'draft' || p.status === 'returned');
  const canReview = isEngineer && p.status === 'in_review';
  const run = (action: 'submit' | 'return' | 'approve') =>
    act.mutate(
      { action, version: p.version, comment, acknowledgeSccr: acknowledged },
      {
        onSuccess: () => {
          setComment('');
          setAcknowledged(false);
        },
      },
    );
  // NEC 409.22: a panel rated below the site's available fault current is signed off only with an
  // acknowledgement and a written reason (the server holds the same rule)
  const sccr = checks.data?.sccr;
  const sccrShort = sccr ? sccr.verdict === 'below-available' || sccr.verdict === 'incomplete' : false;
  // the checks' verdict, or the server's own (it works the rating out from the rebuilt bill of materials)
  const serverAsks = act.error instanceof ApiError && act.error.fieldIssues.some((i) => i.path === 'body.acknowledgeSccr');
  const needsAck = canReview && (sccrShort || serverAsks);
  const reasonShort = comment.trim().length < MIN_REASON;
  const overrideList = p.loads.flatMap((l) => l.overrides.map((o) => ({ tag: l.tag, ...o })));
  const overrides = overrideList.length;
  const swaps = (bom.data?.lines ?? []).filter((l) => l.source === 'swapped');
  const manual = (bom.data?.lines ?? []).filter((l) => l.source === 'manual');
  // what the sign button waits for, in words (the button says it beside itself)
  const signWaitsFor = act.isPending
    ? 'Signing off…'
    : selfRefused
      ? 'Another engineer signs this panel off (see below).'
      : needsAck && !acknowledged
        ? 'Tick the acknowledgement of the short-circuit rating first.'
        : needsAck && reasonShort
          ? `Write why in the comment: ${comment.trim().length} of at least ${MIN_REASON} characters.`
          : null;
  const assumed = p.loads.reduce((n, l) => n + (l.selection?.assumed.length ?? 0), 0);
  const a = from ?? (revs.length > 1 ? revs[revs.length - 2].number : null);
  const b = to ?? (revs.length > 1 ? revs[revs.length - 1].number : null);
  return (
    <div className="grid gap-5 lg:grid-cols-[minmax(0,1fr)_380px]">
      <div className="space-y-5">
        <section className="rounded border border-line bg-panel p-4">
          <h2 className="mb-2 flex items-center gap-2 text-lg font-semibold">
            Sign-off <SignOffState state={p.status} />
          </h2>
          <p className="mb-3 text-sm text-ink-soft">
            Draft → In review → Signed off (a frozen revision) or Returned. Changing a signed-off panel opens a new draft.
          </p>
          {canReview ? (
            <div className="rounded border border-line px-3 py-2 text-sm" role="group" aria-label="Before you sign">
              <p className="mb-1 text-xs font-semibold uppercase text-ink-soft">Before you sign</p>
              {sccr ? (
                <p className={sccrShort ? 'font-semibold text-state-returned' : 'text-state-signed'} data-testid="sign-off-sccr">
                  {sccrShort ? '✖' : '✔'}{' '}
                  {sccr.verdict === 'incomplete'
                    ? 'Panel SCCR could not be determined from the bill of materials (UL 508A SB4).'
                    : sccr.verdict === 'no-available-fault-current'
                      ? `Panel SCCR ${sccr.panelSccrKa} kA; the job gives no available fault current to compare (NEC 409.22).`
                      : `Panel SCCR ${sccr.panelSccrKa} kA ${sccrShort ? 'is below' : 'covers'} the ${sccr.availableFaultKa} kA available at the site (NEC 409.22).`}
                </p>
              ) : null}
              {sccr ? (
                <LimitingParts rows={sccr.limiting} />
              ) : checks.isPending ? (
                <p className="text-ink-soft">Checking the short-circuit rating…</p>
              ) : null}
              {checks.data?.heat.result ? (
                <p data-testid="sign-off-heat" className={checks.data.heat.result.exceeded ? 'text-state-review' : 'text-state-signed'}>
                  {checks.data.heat.result.exceeded ? '◔' : '✔'} Inside the enclosure {checks.data.heat.result.internalTempC.toFixed(1)} °C
                  against a {checks.data.heat.result.internalLimitC} °C limit
                  {checks.data.heat.result.exceeded && checks.data.heat.result.cooling
                    ? `: ${Math.round(checks.data.heat.result.cooling.excessW)} W to remove (fan or air conditioner in the bill of materials?)`
                    : ''}{' '}
                  (IEC TR 60890 simplified).
                </p>
              ) : null}
              {checks.data?.controlPower.fitted?.adequate === false ? (
                <p className="text-state-review">
                  ◔ The control transformer in the bill of materials is smaller than the {checks.data.controlPower.result?.sizeVa} VA
                  needed.
                </p>
              ) : null}
              <p className="text-ink-soft">
                {overrides} override{overrides === 1 ? '' : 's'}, {swaps.length} swapped part{swaps.length === 1 ? '' : 's'} and {assumed}{' '}
                assumed input{assumed === 1 ? '' : 's'} to review
                {checks.data?.bom.stale
                  ? ' (the bill of materials is out of date: the sign-off rebuilds it, keeping the swaps that still fit)'
                  : ''}
                .
              </p>
              <div className="mt-1 grid gap-3 md:grid-cols-2">
                <div aria-label="Overrides" role="group">
                  <p className="text-xs font-semibold uppercase text-ink-soft">Overrides</p>
                  {overrideList.length === 0 ? (
                    <p className="text-ink-soft">None: every decision is the engine's.</p>
                  ) : (
                    <ul className="space-y-1">
                      {overrideList.map((o) => (
                        <li key={`${o.tag}-${o.field}`}>
                          <strong>{o.tag}</strong> · {OVERRIDE_FIELDS[o.field]}: {String(o.was ?? '—')} → <strong>{String(o.value)}</strong>
                          <span className="block text-xs text-ink-soft">
                            “{o.justification}” ({o.by})
                            {o.warnings.length ? <span className="text-state-review"> ◔ {o.warnings.join('; ')}</span> : null}
                          </span>
                        </li>
                      ))}
                    </ul>
                  )}
                </div>
                <div aria-label="Swapped parts" role="group">
                  <p className="text-xs font-semibold uppercase text-ink-soft">Swapped parts</p>
                  {bom.isPending ? (
                    <p className="text-ink-soft">Reading the bill of materials…</p>
                  ) : swaps.length === 0 ? (
                    <p className="text-ink-soft">None: every part is the one the catalogue match picked.</p>
                  ) : (
                    <ul className="space-y-1">
                      {swaps.map((l) => (
                        <li key={l.id}>
                          <strong>{bucketLabel(l.bucket)}</strong> · {categoryLabel(l.category)}: {l.swappedFrom ?? '—'} →{' '}
                          <Link relative="path" to={lineLink(l.bucket, l.code)} className="font-semibold text-copper-700 underline">
                            {l.code}
                          </Link>
                          <span className="block text-xs text-ink-soft">
                            “{l.swapReason}” — meets the line's requirement (checked when it was swapped and at every rebuild)
                          </span>
                        </li>
                      ))}
                    </ul>
                  )}
                  {manual.length ? (
                    <p className="mt-1 text-xs text-ink-soft">
                      {manual.length} manual line{manual.length === 1 ? '' : 's'} (freight, engineering, spares …) added by the estimator.
                    </p>
                  ) : null}
                </div>
              </div>
              {needsAck ? (
                <label className="mt-1 flex items-start gap-2">
                  <input type="checkbox" className="mt-1" checked={acknowledged} onChange={(e) => setAcknowledged(e.target.checked)} />
                  <span>
                    I sign off with this rating and give the reason in the comment (a current-limiting feeder with the maker's let-through
                    data, a corrected fault study …).
                    {acknowledged && reasonShort ? (
                      <span className="block text-xs text-state-returned">Write the reason: at least {MIN_REASON} characters.</span>
                    ) : null}
                  </span>
                </label>
              ) : null}
            </div>
          ) : null}
          {canSubmit || canReview ? (
            <textarea
              aria-label="Sign-off comment"
              className={`${inputClass} mt-2`}
              rows={3}
              placeholder={canReview ? 'What must change (required to return)' : 'Note (optional)'}
              value={comment}
              onChange={(e) => setComment(e.target.value)}
            />
          ) : null}
          <div className="mt-2 flex flex-wrap gap-2">
            {canSubmit ? (
              <Button onClick={() => run('submit')} disabled={act.isPending} waitsFor="Submitting…">
                Submit for sign-off
              </Button>
            ) : null}
            {canReview ? (
              <>
                <Button onClick={() => run('approve')} disabled={signWaitsFor !== null} waitsFor={signWaitsFor}>
                  ✔ Sign off as R{p.revisionNumber === null ? 0 : p.revisionNumber + 1}
                </Button>
                <Button
                  variant="danger"
                  onClick={() => run('return')}
                  disabled={act.isPending || !comment.trim()}
                  waitsFor={act.isPending ? 'Saving…' : 'Say in the comment what must change to return it.'}
                >
                  ↩ Return to designer
                </Button>
              </>
            ) : null}
            {canReview && selfRefused ? (
              <p className="basis-full text-sm text-state-returned" data-testid="sign-off-self">
                ✖ {selfRefused}
              </p>
            ) : canReview && own.data?.selfReview ? (
              <p className="basis-full text-sm text-state-review" data-testid="sign-off-self">
                ◔ You submitted or changed this panel; the shop settings allow you to sign it off, and the activity will record it as a self
                sign-off.
              </p>
            ) : null}
            {p.status === 'in_review' && !isEngineer ? <p className="text-sm text-state-review">◔ Waiting for an engineer.</p> : null}
            {(p.status === 'draft' || p.status === 'returned') && !isDesigner ? (
              <p className="text-sm text-ink-soft" data-testid="sign-off-waiting">
                ◔ Waiting for a panel builder to submit this panel for sign-off.
              </p>
            ) : null}
          </div>
          {act.error ? (
            <div className="mt-2">
              <ErrorNote error={act.error} />
            </div>
          ) : null}
          <div className="mt-3">
            <Caution compact />
          </div>
        </section>
        <section className="rounded border border-line bg-panel p-4">
          <h2 className="mb-2 text-lg font-semibold">Change report</h2>
          {revs.length < 2 ? (
            <p className="text-sm text-ink-soft">
              Two signed-off revisions are needed to compare. {revs.length === 1 ? `R${revs[0].number} exists.` : ''}
            </p>
          ) : (
            <>
              <div className="mb-2 flex items-center gap-2 text-sm">
                Compare
                <select
                  aria-label="From revision"
                  className={`${inputClass} w-24`}
                  value={a ?? ''}
                  onChange={(e) => setFrom(Number(e.target.value))}
                >
                  {revs.map((r) => (
                    <option key={r.number} value={r.number}>
                      R{r.number}
                    </option>
                  ))}
                </select>
                with
                <select
                  aria-label="To revision"
                  className={`${inputClass} w-24`}
                  value={b ?? ''}
                  onChange={(e) => setTo(Number(e.target.value))}
                >
                  {revs.map((r) => (
                    <option key={r.number} value={r.number}>
                      R{r.number}
                    </option>
                  ))}
                </select>
              </div>
              {a !== null && b !== null ? <ChangeReport panelId={panelId} from={a} to={b} /> : null}
            </>
          )}
        </section>
      </div>
      <aside className="space-y-4">
        <section className="rounded border border-line bg-panel p-4">
          <h2 className="mb-2 text-lg font-semibold">Revisions</h2>
          {revs.length === 0 ? (
            <p className="text-sm text-ink-soft">None yet.</p>
          ) : (
            <ul className="text-sm">
              {revs.map((r) => (
                <li key={r.number}>
                  <strong>R{r.number}</strong> signed off by {r.approvedBy ?? '—'} on {new Date(r.approvedAt).toLocaleString()}
                </li>
              ))}
            </ul>
          )}
        </section>
        <section className="rounded border border-line bg-panel p-4" aria-label="Comments">
          <h2 className="mb-2 text-lg font-semibold">Comments</h2>
          {p.comments.length === 0 ? (
            <p className="text-sm text-ink-soft">None yet.</p>
          ) : (
            <ul className="space-y-2 text-sm">
              {p.comments.map((c) => (
                <li key={c.id}>
                  <strong>{c.author}</strong>
                  {c.loadId ? ` on ${p.loads.find((l) => l.id === c.loadId)?.tag ?? 'a motor'}` : ''}: {c.body}
                  <div className="text-xs text-ink-soft">{new Date(c.at).toLocaleString()}</div>
                </li>
              ))}
            </ul>
          )}
        </section>
      </aside>
    </div>
  );
}
