import { Link } from 'react-router-dom';
import type { StoredLine } from '../api/bom';
import { lineLink } from './limiting-parts';
import { bucketLabel, categoryLabel } from './format';

/** The parts an estimator swapped (old → new, with the reason) and the count of manual lines, for the sign-off. */
export function SwappedParts({ lines, pending }: { lines: StoredLine[]; pending: boolean }) {
  const swaps = lines.filter((l) => l.source === 'swapped');
  const manual = lines.filter((l) => l.source === 'manual');
  return (
    <div aria-label="Swapped parts" role="group">
      <p className="text-xs font-semibold uppercase text-ink-soft">Swapped parts</p>
      {pending ? (
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
  );
}
