// The parts that set a panel's SCCR, each linked to its line in the bill of materials (the sign-off section).
import { Link } from 'react-router-dom';
import { lineKey } from './bom-table';
import { PANEL_BUCKET } from '../../../../shared/schemas/catalogue';
import type { SccrRow } from '../../../../shared/calc/sccr';

/** Where a line of the bill of materials is, for a link from this section. */
export const lineLink = (bucket: string, code: string | null) => `../bill-of-materials?line=${encodeURIComponent(lineKey(bucket, code))}`;

/** The parts that set the panel's SCCR (weakest link, UL 508A SB4), each linked to its line in the bill of materials. */
export function LimitingParts({ rows }: { rows: SccrRow[] }) {
  if (rows.length === 0) return null;
  const seen = new Set<string>();
  const unique = rows.filter((r) => {
    const k = `${r.location}|${r.code}`;
    if (seen.has(k)) return false;
    seen.add(k);
    return true;
  });
  const shown = unique.slice(0, 4);
  return (
    <p className="text-sm" data-testid="sign-off-sccr-limiting">
      Limited by{' '}
      {shown.map((r, i) => {
        const bucket = r.location === 'feeder' ? PANEL_BUCKET : r.location;
        return (
          <span key={`${r.location}|${r.code}`}>
            {i > 0 ? (i === shown.length - 1 && unique.length === shown.length ? ' and ' : ', ') : null}
            <Link
              relative="path"
              to={lineLink(bucket, r.code.startsWith('(') ? null : r.code)}
              className="font-semibold text-copper-700 underline"
            >
              {r.code}
            </Link>{' '}
            ({r.location === 'feeder' ? 'feeder' : r.location}, {r.ratingKa ?? '—'} kA)
          </span>
        );
      })}
      {unique.length > shown.length ? ` and ${unique.length - shown.length} more at the same rating` : ''}.
    </p>
  );
}
