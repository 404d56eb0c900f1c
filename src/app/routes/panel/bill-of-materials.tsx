import { useCallback, useMemo, useState } from 'react';
import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { queryClient } from '../../../lib/query-client';
import { hasRole, sessionQueries } from '../../../features/auth/api/session';
import { ROLE_SETS } from '../../../../shared/schemas/auth';
import { panelQueries, useUpdatePanel } from '../../../features/panels/api/panels';
import {
  bomDownloads,
  bomQueries,
  useAddManualLine,
  useDeleteLine,
  useRebuildBom,
  useUpdateLine,
  type StoredLine,
} from '../../../features/bom/api/bom';
import { BomTable, type LineActions } from '../../../features/bom/components/bom-table';
import { ManualLineForm } from '../../../features/bom/components/manual-line-form';
import { SwapForm } from '../../../features/bom/components/swap-form';
import { PricingForm } from '../../../features/bom/components/pricing-form';
import { formatAmount as money } from '../../../../shared/format/money';
import { Caution, Empty, ErrorNote, Loading } from '../../../components/ui/feedback';
import { Button } from '../../../components/ui/button';

export async function loader({ params }: LoaderFunctionArgs) {
  await queryClient.ensureQueryData(bomQueries.panel(Number(params.panelId)));
  return null;
}

const linkButton =
  'inline-flex items-center gap-1 rounded border border-line bg-panel px-3 py-1.5 text-sm font-semibold hover:border-copper-500';

export function Component() {
  const panelId = Number(useParams().panelId);
  const bom = useQuery(bomQueries.panel(panelId));
  const { data: panel } = useQuery(panelQueries.detail(panelId));
  const { data: me } = useQuery(sessionQueries.me());
  const rebuild = useRebuildBom(panelId);
  const addLine = useAddManualLine(panelId);
  const updateLine = useUpdateLine(panelId);
  const deleteLine = useDeleteLine(panelId);
  const updatePanel = useUpdatePanel(panelId);
  const [adding, setAdding] = useState(false);
  const [swapping, setSwapping] = useState<StoredLine | null>(null);
  const [groupBy, setGroupBy] = useState<'bucket' | 'category'>('bucket');
  // ?line=<bucket>|<code>: the line another section points at (the part that limits the SCCR …)
  const [search] = useSearchParams();
  const highlight = search.get('line');
  const qc = useQueryClient();
  // a change to a signed-off panel's bill of materials opens a new draft: the panel's state moves too
  const panelMoved = useCallback(() => qc.invalidateQueries({ queryKey: panelQueries.detail(panelId).queryKey }), [qc, panelId]);
  const canRebuild = hasRole(me, ...ROLE_SETS.rebuildBom);
  const inReview = panel?.status === 'in_review';
  const canPrice = hasRole(me, ...ROLE_SETS.estimate);
  const canEdit = canPrice && !inReview;
  const actions = useMemo<LineActions>(
    () =>
      canEdit
        ? {
            onSwap: (l) => setSwapping(l),
            onRemove: (l) => {
              if (confirm(`Remove "${l.description}"?`)) deleteLine.mutate(l.id, { onSuccess: panelMoved });
            },
            onQuantity: (l, quantity) => updateLine.mutate({ lineId: l.id, quantity }, { onSuccess: panelMoved }),
          }
        : {},
    [canEdit, deleteLine.mutate, updateLine.mutate, panelMoved],
  );
  if (bom.isPending || !panel) return <Loading what="Loading the bill of materials" />;
  if (bom.isError) return <ErrorNote error={bom.error} />;
  const b = bom.data;
  const buckets = [...new Set(b.lines.map((l) => l.bucket))];
  const downloads = bomDownloads.panel(panelId);
  const unmatched = b.totals.unmatchedLines;
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end gap-3">
        <div className="text-sm text-ink-soft">
          {b.generatedAt ? (
            <>
              Built {new Date(b.generatedAt).toLocaleString()} · enclosure NEMA Type {b.enclosureType}
            </>
          ) : (
            'Not built yet'
          )}
        </div>
        <div className="ml-auto flex flex-wrap items-end gap-2">
          <PricingForm
            key={`${panel.markupPercent}-${panel.labourRate}`}
            markupPercent={panel.markupPercent}
            labourRate={panel.labourRate}
            lockedBecause={
              !canPrice
                ? 'An estimator or an administrator sets the pricing.'
                : panel.status === 'in_review'
                  ? 'Pricing waits while the engineer reviews the panel.'
                  : null
            }
            pending={updatePanel.isPending}
            onSave={(v) => updatePanel.mutate({ ...v, version: panel.version })}
          />
          <a className={linkButton} href={downloads.xlsx} download>
            ⬇ Export .xlsx
          </a>
          <a className={linkButton} href={downloads.csv} download>
            ⬇ Export .csv
          </a>
        </div>
      </div>
      {updatePanel.error ? <ErrorNote error={updatePanel.error} /> : null}
      {inReview ? (
        <p role="status" className="rounded border border-state-review/50 bg-warn-bg px-3 py-2 text-sm">
          <span className="font-semibold text-state-review">◔ In review.</span> Swaps, manual lines and rebuilds with other parts wait until
          the engineer signs the panel off or returns it.
        </p>
      ) : panel.status === 'signed_off' && canRebuild ? (
        <p role="status" className="rounded border border-line bg-surface px-3 py-2 text-sm">
          ✔ Signed off as R{panel.revisionNumber}. A swap, a manual line or a rebuild with other parts opens a new draft, which needs a new
          sign-off.
        </p>
      ) : null}

      {b.stale ? (
        <div role="status" className="flex flex-wrap items-center gap-3 rounded border border-state-review/50 bg-warn-bg px-3 py-2 text-sm">
          <span className="font-semibold text-state-review">◔ Out of date.</span>
          {b.generatedAt
            ? 'The motors, their overrides or the catalogue changed since this bill of materials was built.'
            : 'This panel has no bill of materials yet.'}
          {canRebuild ? (
            <Button
              disabled={rebuild.isPending || inReview}
              waitsFor={inReview ? 'A rebuild with other parts waits for the engineer to finish the review.' : null}
              onClick={() => rebuild.mutate({}, { onSuccess: panelMoved })}
            >
              {rebuild.isPending ? 'Rebuilding…' : 'Rebuild'}
            </Button>
          ) : (
            <span>An estimator or designer can rebuild it.</span>
          )}
        </div>
      ) : (
        <div className="flex flex-wrap items-center gap-2 text-sm">
          <span className="text-state-signed">✔ Up to date with the motors and the catalogue.</span>
          {canRebuild ? (
            <Button variant="secondary" disabled={rebuild.isPending} onClick={() => rebuild.mutate({}, { onSuccess: panelMoved })}>
              {rebuild.isPending ? 'Rebuilding…' : 'Rebuild'}
            </Button>
          ) : null}
          {canPrice ? (
            <Button
              variant="ghost"
              disabled={rebuild.isPending}
              title="Rebuild and take today's catalogue prices for every line"
              onClick={() => {
                if (confirm("Re-price every line at today's catalogue prices?")) rebuild.mutate({ reprice: true });
              }}
            >
              Re-price at today's catalogue
            </Button>
          ) : null}
        </div>
      )}
      {rebuild.error ? <ErrorNote error={rebuild.error} /> : null}

      {unmatched > 0 ? (
        <p role="alert" className="rounded border border-state-returned/40 bg-bad-bg px-3 py-2 text-sm text-state-returned">
          ✖{' '}
          <strong>
            {unmatched} unmatched line{unmatched === 1 ? '' : 's'}
          </strong>
          : nothing active in the catalogue meets the ratings shown. They are priced at 0 until a part is chosen or the catalogue gets one.
        </p>
      ) : null}

      <div className="flex flex-wrap items-center gap-3">
        <div role="radiogroup" aria-label="Group lines by" className="flex overflow-hidden rounded border border-line text-sm">
          {(['bucket', 'category'] as const).map((g) => (
            <button
              key={g}
              type="button"
              role="radio"
              aria-checked={groupBy === g}
              onClick={() => setGroupBy(g)}
              className={`px-3 py-1 ${groupBy === g ? 'bg-header text-header-ink' : 'bg-panel hover:bg-copper-50'}`}
            >
              By {g === 'bucket' ? 'bucket (motor)' : 'category'}
            </button>
          ))}
        </div>
        {canPrice && !adding ? (
          <Button
            variant="secondary"
            disabled={inReview}
            waitsFor="Manual lines wait for the engineer to finish the review."
            onClick={() => setAdding(true)}
          >
            + Manual line
          </Button>
        ) : null}
        <span className="ml-auto text-sm">
          Material <strong>${money(b.totals.materialCost)}</strong> · Labour <strong>{money(b.totals.labourHours)} h</strong> · Sell{' '}
          <strong>${money(b.totals.sell)}</strong>
        </span>
      </div>
      {adding ? (
        <ManualLineForm
          buckets={buckets}
          pending={addLine.isPending}
          error={addLine.error}
          onCancel={() => setAdding(false)}
          onSubmit={(v) =>
            addLine.mutate(v, {
              onSuccess: () => {
                setAdding(false);
                void panelMoved();
              },
            })
          }
        />
      ) : null}
      {swapping ? (
        <SwapForm
          key={swapping.id}
          panelId={panelId}
          line={swapping}
          pending={updateLine.isPending}
          error={updateLine.error}
          onCancel={() => setSwapping(null)}
          onSubmit={(v) =>
            updateLine.mutate(
              { lineId: swapping.id, ...v },
              {
                onSuccess: () => {
                  setSwapping(null);
                  void panelMoved();
                },
              },
            )
          }
        />
      ) : null}
      {!swapping && updateLine.error ? <ErrorNote error={updateLine.error} /> : null}
      {deleteLine.error ? <ErrorNote error={deleteLine.error} /> : null}

      {b.lines.length === 0 ? (
        <Empty title="No lines yet">
          {canRebuild
            ? 'Rebuild to pick catalogue items for every motor and for the panel.'
            : 'An estimator or designer builds it from the motors.'}
        </Empty>
      ) : (
        <BomTable lines={b.lines} totals={b.totals} actions={actions} groupBy={groupBy} highlight={highlight} />
      )}
      <Caution compact />
    </div>
  );
}
