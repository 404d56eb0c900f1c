import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { panelQueries } from '../../../features/panels/api/panels';
import { checkQueries, submittalPdfUrl } from '../../../features/checks/api/checks';
import type { PanelChecks } from '../../../../shared/schemas/checks';
import { OneLine, type MotorFeed } from '../../../features/drawings/components/one-line';
import { motorFeed } from '../../../../shared/calc/other-sources';
import { ConnectionCardDrawing } from '../../../features/drawings/components/connection-card';
import { queryClient } from '../../../lib/query-client';
import { drawingQueries, drawingUrls } from '../../../features/drawings/api/drawings';
import { SheetView } from '../../../features/drawings/components/sheet-view';
import { TerminalPlan } from '../../../features/drawings/components/terminal-plan';
import type { DrawingsView, SheetRef } from '../../../../shared/drawings/panel-drawings';
import { Caution, Empty, ErrorNote, Loading } from '../../../components/ui/feedback';
import type { LoadView } from '../../../../shared/schemas/panel';

export async function loader({ params }: LoaderFunctionArgs) {
  const id = Number(params.panelId);
  await Promise.all([queryClient.ensureQueryData(panelQueries.detail(id)), queryClient.prefetchQuery(checkQueries.panel(id)), queryClient.prefetchQuery(drawingQueries.panel(id))]);
  return null;
}

const ROTATION = 'Check rotation before coupling the load.';

function Bucket({ load, card, feed }: { load: LoadView; card: PanelChecks['connectionCards'][number] | undefined; feed: MotorFeed }) {
  const s = load.effective ?? load.selection;
  const answers = load.answers as { description?: string; hp?: number; kw?: number; volts?: number; supply?: string };
  const rating = [answers.hp !== undefined ? `${answers.hp} hp` : answers.kw !== undefined ? `${answers.kw} kW` : null, answers.volts !== undefined ? `${answers.volts} V` : null, answers.supply === 'dc' ? 'DC' : answers.supply === 'ac1' ? '1φ' : '3φ']
    .filter(Boolean)
    .join(' · ');
  return (
    <article aria-labelledby={`bucket-${load.id}`} className="rounded border border-line bg-panel p-4">
      <header className="mb-3 flex flex-wrap items-baseline gap-x-3 border-b border-line pb-2">
        <h2 id={`bucket-${load.id}`} className="text-lg font-semibold">
          {load.tag}
        </h2>
        <span className="text-sm text-ink-soft">{answers.description ?? ''}</span>
        <span className="ml-auto font-dense text-sm text-ink-soft">{rating}</span>
      </header>
      <div className="grid gap-6 lg:grid-cols-2">
        <div>
          <h3 className="mb-1 text-xs font-semibold tracking-wide text-ink-soft uppercase">One-line</h3>
          {s && s.errors.length === 0 ? (
            <OneLine selection={s} feed={feed} />
          ) : (
            <p className="text-sm text-state-returned">✖ No one-line until the motor’s selection is fixed{s ? `: ${s.errors.join('; ')}` : ''}.</p>
          )}
        </div>
        <div>
          <h3 className="mb-1 text-xs font-semibold tracking-wide text-ink-soft uppercase">Motor lead connection</h3>
          {card?.card ? (
            <>
              <div className="max-w-full overflow-x-auto">
                <ConnectionCardDrawing card={card.card} width={600} />
              </div>
              <dl className="mt-2 space-y-1 text-sm">
                <div>
                  <dt className="inline font-semibold">To reverse: </dt>
                  <dd className="inline">{card.card.reverse}</dd>
                </div>
              </dl>
              {card.assumptions.length > 0 ? (
                <ul className="mt-1 space-y-0.5 text-xs text-state-review">
                  {card.assumptions.map((a) => (
                    <li key={a}>⚠ {a}</li>
                  ))}
                </ul>
              ) : null}
              {card.card.notes.length > 0 ? <p className="mt-1 text-xs text-ink-soft">{card.card.notes.join(' ')} ({card.card.basis})</p> : null}
            </>
          ) : (
            <p className="text-sm">⚠ {card?.reason ?? 'No connection card for this motor.'}</p>
          )}
          <p className="mt-2 rounded border border-state-review/40 bg-warn-bg px-2 py-1 text-sm font-semibold" role="note">
            ⚠ {ROTATION}
          </p>
        </div>
      </div>
    </article>
  );
}

function SvgSheet({ panelId, sheet }: { panelId: number; sheet: SheetRef }) {
  const q = useQuery(
    sheet.kind === 'nameplate'
      ? drawingQueries.nameplate(panelId)
      : sheet.kind === 'supply'
        ? { ...drawingQueries.schematic(panelId, '(supply)'), queryFn: () => fetch(`${drawingUrls(panelId).schematic}?sheet=supply`, { credentials: 'same-origin' }).then((r) => r.text()) }
        : drawingQueries.schematic(panelId, sheet.tag ?? ''),
  );
  if (q.isPending) return <Loading what={`Drawing ${sheet.title}`} />;
  if (q.isError) return <ErrorNote error={q.error} />;
  return (
    <div className={sheet.kind === 'nameplate' ? 'max-w-xl' : ''}>
      <SheetView svg={q.data} label={`${sheet.number} ${sheet.title}`} />
      {sheet.kind === 'nameplate' ? <p className="mt-2 text-xs text-ink-soft">Print at 100 % for a 5 × 3 in label. The values come from the panel checks; a qualified person verifies them before the label is fixed.</p> : null}
    </div>
  );
}

function Sheets({ panelId, view }: { panelId: number; view: DrawingsView }) {
  const first = view.sheets.find((s) => s.kind === 'schematic') ?? view.sheets[0];
  const [current, setCurrent] = useState<string | undefined>(first?.number);
  const sheet = view.sheets.find((s) => s.number === current) ?? first;
  const urls = drawingUrls(panelId);
  return (
    <section aria-labelledby="sheets-title" className="rounded border border-line bg-panel p-4">
      <header className="mb-3 flex flex-wrap items-baseline gap-x-4 gap-y-1 border-b border-line pb-2">
        <h2 id="sheets-title" className="text-lg font-semibold">
          Drawings {view.drawingNumber}
        </h2>
        <span className="text-xs text-ink-soft">{view.standard}</span>
        <nav aria-label="Drawing downloads" className="ml-auto flex flex-wrap gap-3 text-sm font-semibold text-copper-700">
          <a href={urls.schematic} download>⤓ Schematics (.svg)</a>
          <a href={urls.wiring} download>⤓ Terminal plan and wire list (.xlsx)</a>
          <a href={urls.terminals} download>⤓ Terminals (.csv)</a>
          <a href={urls.wires} download>⤓ Wires (.csv)</a>
          <a href={urls.nameplate} download>⤓ Nameplate (.svg)</a>
        </nav>
      </header>
      {view.warnings.length > 0 ? (
        <ul className="mb-3 space-y-1 rounded border border-state-review/40 bg-warn-bg px-3 py-2 text-sm" role="note">
          {view.warnings.map((w) => (
            <li key={w}>⚠ {w}</li>
          ))}
        </ul>
      ) : null}
      <div className="grid gap-4 lg:grid-cols-[16rem_1fr]">
        <nav aria-label="Sheet list">
          <ol className="space-y-0.5 text-sm">
            {view.sheets.map((s) => (
              <li key={s.number}>
                <button
                  type="button"
                  onClick={() => setCurrent(s.number)}
                  aria-current={s.number === sheet?.number ? 'page' : undefined}
                  className={`w-full rounded px-2 py-1 text-left ${s.number === sheet?.number ? 'bg-copper-100 font-semibold' : 'hover:bg-surface'}`}
                >
                  <span className="block font-dense text-xs text-ink-soft">{s.number}</span>
                  {s.title}
                </button>
              </li>
            ))}
          </ol>
        </nav>
        <div className="min-w-0">
          {sheet?.kind === 'terminals' ? (
            <>
              <p className="mb-2 text-sm">
                {view.terminals.length} terminals, the {view.bomTerminalBlocks} terminal blocks of the bill of materials. {view.colourPractice}
              </p>
              <TerminalPlan rows={view.terminals} />
            </>
          ) : sheet?.kind === 'wires' ? (
            <>
              <p className="mb-2 text-sm">{view.wires.length} wires. {view.colourPractice}</p>
              <div className="max-h-[32rem] overflow-auto rounded border border-line">
                <table className="w-full text-sm">
                  <thead className="sticky top-0 bg-surface text-left text-xs uppercase text-ink-soft">
                    <tr>
                      <th className="px-2 py-1">Wire</th>
                      <th className="px-2 py-1">From</th>
                      <th className="px-2 py-1">To</th>
                      <th className="px-2 py-1">Conductor</th>
                      <th className="px-2 py-1">Colour</th>
                      <th className="px-2 py-1">Sheet</th>
                    </tr>
                  </thead>
                  <tbody className="font-dense">
                    {view.wires.map((w, i) => (
                      <tr key={i} className="border-t border-line">
                        <td className="px-2 py-0.5 font-semibold text-copper-700">{w.wire}</td>
                        <td className="px-2 py-0.5">{w.from}</td>
                        <td className="px-2 py-0.5">{w.to}</td>
                        <td className="px-2 py-0.5">{w.conductor}</td>
                        <td className="px-2 py-0.5">{w.colour}</td>
                        <td className="px-2 py-0.5">{w.sheet}</td>
                      </tr>
                    ))}
                  </tbody>
                </table>
              </div>
            </>
          ) : sheet ? (
            <SvgSheet key={sheet.number} panelId={panelId} sheet={sheet} />
          ) : null}
        </div>
      </div>
    </section>
  );
}

export function Component() {
  const { panelId } = useParams();
  const id = Number(panelId);
  const panel = useQuery(panelQueries.detail(id));
  const checks = useQuery(checkQueries.panel(id));
  const drawings = useQuery(drawingQueries.panel(id));
  if (panel.isPending) return <Loading what="Loading drawings" />;
  if (panel.isError) return <ErrorNote error={panel.error} />;
  const p = panel.data;
  const cards = new Map((checks.data?.connectionCards ?? []).map((c) => [c.loadId, c]));
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p className="text-sm text-ink-soft">Control schematic per bucket, terminal plan, wire list and panel marking, generated from the stored selections and the bill of materials; one-line and lead connection of each motor (NEMA MG 1 lead markings).</p>
        {p.loads.length > 0 ? (
          <a
            href={submittalPdfUrl(id)}
            download
            className="inline-flex items-center gap-1.5 rounded bg-copper-600 px-3 py-1.5 text-sm font-semibold text-white hover:bg-copper-700"
          >
            <span aria-hidden>⤓</span> Download submittal (PDF)
          </a>
        ) : null}
      </div>
      {p.loads.length > 0 && drawings.isError ? <ErrorNote error={drawings.error} /> : null}
      {p.loads.length > 0 && drawings.data ? <Sheets panelId={id} view={drawings.data} /> : null}
      {checks.isError ? <ErrorNote error={checks.error} /> : null}
      {checks.isPending ? <Loading what="Working out the connection cards" /> : null}
      {p.loads.length === 0 ? (
        <Empty title="No motors on this panel yet">Add motors to see their one-lines and connection cards.</Empty>
      ) : (
        p.loads.map((l) => <Bucket key={l.id} load={l} card={cards.get(l.id)} feed={motorFeed(p.rollup, l.tag)} />)
      )}
      <Caution />
    </div>
  );
}
