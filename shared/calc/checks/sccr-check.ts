// The SCCR worksheet of the panel checks (UL 508A SB4, NEC 409.22): the calculation of shared/calc/sccr on
// the bill of materials' power-circuit components, with ways out priced from the catalogue when the panel
// rating is below the available fault current.
import { PANEL_BUCKET, type BomLine, type CatalogueItem } from '../../schemas/catalogue';
import type { SccrCheck } from '../../schemas/checks';
import type { LoadSelection, PanelRollup } from '../../schemas/selection';
import { indexCatalogue, selectItem } from '../bom';
import { round2 } from '../round';
import { calculatePanelSccr, type SccrComponentInput, type SccrInput, type SccrResult, type SccrWayOut } from '../sccr';
import { isDropInReplacement } from './drop-in';
import { sccrInputFor } from './sccr-components';

function replaceComponent(input: SccrInput, location: string, code: string, by: SccrComponentInput): SccrInput {
  const swap = (list: SccrComponentInput[]) => list.map((c) => (c.code === code ? { ...by, qty: c.qty } : c));
  if (location === 'feeder') return { ...input, feeder: swap(input.feeder) };
  return { ...input, buckets: input.buckets.map((b) => (b.tag === location ? { ...b, components: swap(b.components) } : b)) };
}

/**
 * Ways out with catalogue prices: a drop-in part with a marked rating at or above the available fault current
 * for each weak component (and all of them together), and a fused main disconnect with current-limiting
 * Class J fuses in place of a main breaker. The weakest-link advice of the SCCR calculation follows.
 */
function waysOut(
  input: SccrInput,
  result: SccrResult,
  lines: readonly BomLine[],
  byCode: ReadonlyMap<string, CatalogueItem>,
  selections: ReadonlyMap<string, LoadSelection>,
  supply: { volts: number; phases: number },
  rollup: PanelRollup | null,
): SccrWayOut[] {
  const available = result.availableFaultKa;
  if (result.verdict !== 'below-available' || available === null) return result.waysOut;
  const catalogue = [...byCode.values()];
  const out: SccrWayOut[] = [];
  let all = input;
  let allCost: number | null = 0;
  const allCodes: string[] = [];
  let missing = 0;
  const weak = result.rows.filter((r) => r.belowAvailable);
  const seen = new Set<string>();
  for (const row of weak) {
    const key = `${row.location}|${row.code}`;
    if (seen.has(key)) continue;
    seen.add(key);
    const current = byCode.get(row.code);
    const candidates = current
      ? catalogue.filter((c) => c.sccrKa !== null && c.sccrKa >= available && isDropInReplacement(current, c, selections.get(row.location)))
      : [];
    if (!current || candidates.length === 0) {
      missing++;
      continue;
    }
    const best = candidates.reduce((x, y) =>
      y.unitCost < x.unitCost || (y.unitCost === x.unitCost && (y.sccrKa ?? 0) > (x.sccrKa ?? 0)) ? y : x,
    );
    const line = lines.find(
      (l) => l.code === row.code && (l.bucket === row.location || (row.location === 'feeder' && l.bucket === PANEL_BUCKET)),
    );
    const qty = row.qty;
    const costDifference = round2((best.unitCost - (line?.unitCost ?? current.unitCost)) * qty);
    const by: SccrComponentInput = {
      code: best.code,
      category: row.category,
      description: best.description,
      sccrKa: best.sccrKa ?? 0,
      cost: best.unitCost,
    };
    const after = calculatePanelSccr(replaceComponent(input, row.location, row.code, by));
    out.push({
      kind: 'higher-rated-component',
      description: `${row.location}: replace ${row.code} (${row.ratingKa} kA, ${row.source}) by ${best.code} marked ${best.sccrKa} kA (${best.description})`,
      resultingSccrKa: after.panelSccrKa,
      resolves: after.panelSccrKa !== null && after.panelSccrKa >= available,
      costDifference,
      partCodes: [best.code],
    });
    all = replaceComponent(all, row.location, row.code, by);
    allCost = allCost === null ? null : round2(allCost + costDifference);
    allCodes.push(best.code);
  }
  if (out.length > 1) {
    const after = calculatePanelSccr(all);
    out.push({
      kind: 'replace-all-weak',
      description: `Replace every component below ${available} kA that has a drop-in marked part${missing ? ` (${missing} have none in the catalogue)` : ''}`,
      resultingSccrKa: after.panelSccrKa,
      resolves: after.panelSccrKa !== null && after.panelSccrKa >= available,
      costDifference: allCost,
      partCodes: allCodes,
    });
  }
  const fused = currentLimitingFeeder(input, lines, catalogue, supply, rollup, available);
  // the calculation was given no alternatives, so its own ways out are the general advice
  return [...out, ...(fused ? [fused] : []), ...result.waysOut];
}

/** A fused main with Class J (current-limiting) fuses instead of a main breaker, when the catalogue has both. */
function currentLimitingFeeder(
  input: SccrInput,
  lines: readonly BomLine[],
  catalogue: readonly CatalogueItem[],
  supply: { volts: number; phases: number },
  rollup: PanelRollup | null,
  available: number,
): SccrWayOut | null {
  const mainLine = lines.find((l) => l.bucket === PANEL_BUCKET && l.category === 'main-breaker' && l.code);
  if (!mainLine || !rollup || rollup.feeder.ocpdMaxAmps <= 0) return null;
  const index = indexCatalogue(catalogue);
  const poles = supply.phases === 1 ? 2 : 3;
  const fuse = selectItem(index, {
    category: 'fuse',
    maxAmps: rollup.feeder.ocpdMaxAmps,
    fuseClass: 'J',
    timeDelay: true,
    volts: supply.volts,
    prefer: 'largest',
  });
  const sw = fuse
    ? selectItem(index, { category: 'main-disconnect', minAmps: fuse.ratings.amps, fuseClass: 'J', poles, volts: supply.volts })
    : null;
  if (!fuse || !sw) return null;
  const feeder = input.feeder.flatMap((c): SccrComponentInput[] =>
    c.code === mainLine.code
      ? [
          {
            code: sw.code,
            category: 'disconnect-switch',
            description: sw.description,
            qty: 1,
            cost: sw.unitCost,
            ...(sw.sccrKa !== null ? { sccrKa: sw.sccrKa } : {}),
          },
          {
            code: fuse.code,
            category: 'fuse',
            description: fuse.description,
            qty: poles,
            cost: fuse.unitCost,
            ...(fuse.sccrKa !== null ? { sccrKa: fuse.sccrKa } : {}),
          },
        ]
      : [c],
  );
  const after = calculatePanelSccr({ ...input, feeder });
  return {
    kind: 'current-limiting-feeder',
    description:
      `Replace main breaker ${mainLine.code} by fused main disconnect ${sw.code} with ${poles} × Class J fuses ${fuse.code}. ` +
      `Branch ratings rise only where the fuse maker's published peak let-through at ${available} kA is at or below them (UL 508A SB4.3); ` +
      'the catalogue holds no let-through data, so the resulting rating shown is without that raise.',
    resultingSccrKa: after.panelSccrKa,
    resolves: after.panelSccrKa !== null && after.panelSccrKa >= available,
    costDifference: round2(sw.unitCost + poles * fuse.unitCost - mainLine.unitCost * mainLine.quantity),
    partCodes: [sw.code, fuse.code],
  };
}

export interface SccrCheckInput {
  lines: readonly BomLine[];
  catalogue: ReadonlyMap<string, CatalogueItem>;
  /** the effective selections without errors */
  selections: readonly LoadSelection[];
  combinations: SccrInput['combinations'];
  supply: { volts: number; phases: number; availableFaultKa: number | null };
  rollup: PanelRollup | null;
}

/** The panel's SCCR worksheet with its ways out and the components left out of it. */
export function sccrCheck(input: SccrCheckInput): SccrCheck {
  const { input: worksheet, parts } = sccrInputFor(
    input.lines,
    input.catalogue,
    input.selections,
    input.combinations,
    input.supply.availableFaultKa,
  );
  const base = calculatePanelSccr(worksheet);
  const bySel = new Map(input.selections.map((s) => [s.tag, s]));
  return {
    ...base,
    waysOut: waysOut(worksheet, base, input.lines, input.catalogue, bySel, input.supply, input.rollup),
    excluded: parts.excluded,
  };
}
