// The drawing sheets of a panel: the sheet list beside the sheet shown, with the downloads.
import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { drawingQueries, drawingUrls } from '../api/drawings';
import { SheetView } from './sheet-view';
import type { DrawingsView, SheetRef } from '../../../../shared/drawings/panel-drawings';
import { ErrorNote, Loading } from '../../../components/ui/feedback';
import { TerminalPlan } from './terminal-plan';
import { LayoutNotes } from './layout-notes';

function SvgSheet({ panelId, sheet, layout }: { panelId: number; sheet: SheetRef; layout: DrawingsView['layout'] }) {
  const q = useQuery(
    sheet.kind === 'nameplate'
      ? drawingQueries.nameplate(panelId)
      : sheet.kind === 'layout'
        ? drawingQueries.layout(panelId)
        : sheet.kind === 'supply'
          ? {
              ...drawingQueries.schematic(panelId, '(supply)'),
              queryFn: () => fetch(`${drawingUrls(panelId).schematic}?sheet=supply`, { credentials: 'same-origin' }).then((r) => r.text()),
            }
          : drawingQueries.schematic(panelId, sheet.tag ?? ''),
  );
  if (q.isPending) return <Loading what={`Drawing ${sheet.title}`} />;
  if (q.isError) return <ErrorNote error={q.error} />;
  return (
    <div className={sheet.kind === 'nameplate' ? 'max-w-xl' : ''}>
      <SheetView svg={q.data} label={`${sheet.number} ${sheet.title}`} />
      {sheet.kind === 'nameplate' ? (
        <p className="mt-2 text-xs text-ink-soft">
          Print at 100 % for a 5 × 3 in label. The values come from the panel checks; a qualified person verifies them before the label is
          fixed.
        </p>
      ) : null}
      {sheet.kind === 'layout' ? <LayoutNotes layout={layout} /> : null}
    </div>
  );
}

export function Sheets({ panelId, view }: { panelId: number; view: DrawingsView }) {
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
          <a href={urls.schematic} download>
            ⤓ Schematics (.svg)
          </a>
          <a href={urls.wiring} download>
            ⤓ Terminal plan and wire list (.xlsx)
          </a>
          <a href={urls.terminals} download>
            ⤓ Terminals (.csv)
          </a>
          <a href={urls.wires} download>
            ⤓ Wires (.csv)
          </a>
          <a href={urls.layout} download>
            ⤓ Backplate layout (.svg)
          </a>
          <a href={urls.nameplate} download>
            ⤓ Nameplate (.svg)
          </a>
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
                {view.terminals.length} terminals, the {view.bomTerminalBlocks} terminal blocks of the bill of materials.{' '}
                {view.colourPractice}
              </p>
              <TerminalPlan rows={view.terminals} />
            </>
          ) : sheet?.kind === 'wires' ? (
            <>
              <p className="mb-2 text-sm">
                {view.wires.length} wires. {view.colourPractice}
              </p>
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
            <SvgSheet key={sheet.number} panelId={panelId} sheet={sheet} layout={view.layout} />
          ) : null}
        </div>
      </div>
    </section>
  );
}
