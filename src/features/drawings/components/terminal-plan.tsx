import type { TerminalRow } from '../../../../shared/drawings/panel-drawings';

const GROUP: Record<string, string> = {
  motor: 'Motor lead',
  ground: 'Ground',
  remote: 'Remote device',
  plc: 'Plant control',
  supply: 'Supply',
  spare: 'Spare',
};

export function TerminalPlan({ rows }: { rows: TerminalRow[] }) {
  return (
    <div className="max-h-[32rem] overflow-auto rounded border border-line">
      <table className="w-full text-sm">
        <thead className="sticky top-0 bg-surface text-left text-xs uppercase text-ink-soft">
          <tr>
            <th className="px-2 py-1">Terminal</th>
            <th className="px-2 py-1">Wire</th>
            <th className="px-2 py-1">Purpose</th>
            <th className="px-2 py-1">Group</th>
            <th className="px-2 py-1">Panel side</th>
            <th className="px-2 py-1">Field side</th>
            <th className="px-2 py-1">Conductor</th>
            <th className="px-2 py-1">Colour</th>
          </tr>
        </thead>
        <tbody className="font-dense">
          {rows.map((t) => (
            <tr key={`${t.bucket}|${t.ref}`} className="border-t border-line">
              <td className="px-2 py-0.5 font-semibold">{t.ref}</td>
              <td className="px-2 py-0.5 text-copper-700">{t.wire}</td>
              <td className="px-2 py-0.5">
                {t.purpose}
                {!t.inBom ? <span className="ml-1 text-state-returned">✖ not in the bill of materials</span> : null}
              </td>
              <td className="px-2 py-0.5">{GROUP[t.group] ?? t.group}</td>
              <td className="px-2 py-0.5">{t.panelSide}</td>
              <td className="px-2 py-0.5">{t.field}</td>
              <td className="px-2 py-0.5">{t.conductor}</td>
              <td className="px-2 py-0.5">{t.colour}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
