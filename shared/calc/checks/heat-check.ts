// The heat load of the panel checks (IEC TR 60890 simplified, shared/calc/heat): the enclosure and the
// heat sources of the bill of materials, drives and soft starters at their motor's load current.
import { PANEL_BUCKET, type BomLine, type CatalogueItem } from '../../schemas/catalogue';
import type { HeatCheck } from '../../schemas/checks';
import type { LoadSelection } from '../../schemas/selection';
import { calculateHeat, type EnclosureMounting, type HeatSourceInput } from '../heat';

/** The panel's stored mounting as the heat method's mounting. */
export function heatMounting(mounting: string): EnclosureMounting {
  const map: Record<string, EnclosureMounting> = {
    'free-standing': 'free-standing',
    'wall-mounted': 'wall-mounted',
    'row-end': 'row-end-free-standing',
    'row-middle': 'row-middle-free-standing',
    'wall-row-end': 'row-end-wall-mounted',
    'wall-row-middle': 'row-middle-wall-mounted',
  };
  return map[mounting] ?? 'wall-mounted';
}

export function heatCheck(
  lines: readonly BomLine[],
  byCode: ReadonlyMap<string, CatalogueItem>,
  selections: ReadonlyMap<string, LoadSelection>,
  mounting: string,
  ambientC: number,
): HeatCheck {
  const m = heatMounting(mounting);
  const encLine = lines.find((l) => l.category === 'enclosure' && l.code);
  const enc = encLine?.code ? byCode.get(encLine.code) : undefined;
  const r = enc?.ratings;
  if (!encLine || !r?.heightMm || !r.widthMm || !r.depthMm) {
    return {
      result: null,
      enclosure: null,
      reason: 'No enclosure with dimensions in the bill of materials: the heat load needs the enclosure’s height, width and depth.',
    };
  }
  const sections = Math.max(1, Math.round(encLine.quantity));
  const sources: HeatSourceInput[] = [];
  for (const l of lines) {
    const atLoad = l.category === 'vfd' || l.category === 'soft-starter' || l.category === 'dc-drive';
    if (!(l.heatLossW > 0) && !atLoad) continue;
    const bucketTag = l.bucket === PANEL_BUCKET ? null : l.bucket;
    const sel = bucketTag ? selections.get(bucketTag) : undefined;
    const item = l.code ? byCode.get(l.code) : undefined;
    const ratedAmps = item ? (item.ratings.normalDutyAmps ?? item.ratings.amps) : undefined;
    sources.push({
      bucketTag,
      code: l.code ?? `(unmatched ${l.category})`,
      description: l.description,
      category: l.category,
      qty: l.quantity,
      ...(l.status === 'unmatched' ? {} : { heatLossW: l.heatLossW }),
      ...(atLoad && sel ? { loadAmps: sel.flaAmps, ...(ratedAmps ? { ratedAmps } : {}), bypassed: sel.softStarter?.bypass ?? false } : {}),
    });
  }
  const enclosure = {
    code: encLine.code,
    description: encLine.description,
    heightMm: r.heightMm,
    widthMm: r.widthMm * sections,
    depthMm: r.depthMm,
    sections,
    mounting: m,
  };
  const result = calculateHeat({
    enclosure: { heightM: r.heightMm / 1000, widthM: (r.widthMm * sections) / 1000, depthM: r.depthMm / 1000, mounting: m },
    sources,
    ambientC,
  });
  if (sections > 1) result.notes.push(`${sections} enclosure sections taken as one lineup ${sections} × ${r.widthMm} mm wide.`);
  return { result, enclosure, reason: null };
}
