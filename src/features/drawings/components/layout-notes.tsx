// Beside the backplate layout sheet: the enclosure it is laid out in and every part it could not place.
import type { DrawingsView } from '../../../../shared/drawings/panel-drawings';

export function LayoutNotes({ layout }: { layout: DrawingsView['layout'] }) {
  if (!layout) return null;
  const e = layout.enclosure;
  return (
    <div className="mt-2 space-y-2 text-sm">
      <p>
        {e
          ? `${layout.placedCount} parts laid out in ${e.code} (${e.heightMm} × ${e.widthMm} × ${e.depthMm} mm${layout.sections > 1 ? `, ${layout.sections} sections` : ''}), the enclosure of the bill of materials and of the heat check.`
          : 'The bill of materials has no enclosure with dimensions, so the backplate is not laid out.'}{' '}
        Duct and spacing follow common practice; a qualified person checks the layout against the parts’ instructions before the panel is
        built.
      </p>
      {layout.unplaced.length > 0 ? (
        <div role="alert" className="rounded border border-state-review/40 bg-warn-bg px-3 py-2">
          <p className="font-semibold">
            ⚠ {layout.unplaced.length} {layout.unplaced.length === 1 ? 'part' : 'parts'} not placed
          </p>
          <ul className="mt-1 list-disc pl-5">
            {layout.unplaced.map((u) => (
              <li key={`${u.bucket}-${u.tag}`}>
                {u.tag} {u.code ?? u.description} ({u.bucket}): {u.reason}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </div>
  );
}
