// The SCCR worksheet's input (UL 508A SB4) from a bill of materials: its power-circuit components by
// location, the buckets' horsepower and voltage from the selections, and the tested combinations.
import { PANEL_BUCKET, type BomLine, type CatalogueItem } from '../../schemas/catalogue';
import type { ExcludedComponent } from '../../schemas/checks';
import type { LoadSelection } from '../../schemas/selection';
import { sccrTypeForCatalogueCategory, type SccrBucketInput, type SccrComponentInput, type SccrInput } from '../sccr';

function component(line: BomLine, type: NonNullable<ReturnType<typeof sccrTypeForCatalogueCategory>>): SccrComponentInput {
  return {
    code: line.code ?? `(unmatched ${line.category})`,
    category: type,
    description: line.description,
    qty: line.quantity,
    cost: line.unitCost,
    ...(line.sccrKa !== null ? { sccrKa: line.sccrKa } : {}),
  };
}

/**
 * The power-circuit components of the bill of materials, by location. Control-circuit parts fed from the
 * transformer's secondary (the buckets' control fuses and holders, the secondary fuse, control and ground
 * terminals) are left out and listed with the reason; the transformer's primary fuses count (product choice,
 * stated on the worksheet).
 */
export function sccrComponents(lines: readonly BomLine[], byCode: ReadonlyMap<string, CatalogueItem>) {
  const feeder: SccrComponentInput[] = [];
  const buckets = new Map<string, SccrComponentInput[]>();
  const excluded: ExcludedComponent[] = [];
  const state = new Map<string, { pilotSeen: boolean; powerTerminal: boolean; cptSeen: boolean; cptFuse: number; cptHolder: number }>();
  for (const line of lines) {
    const where = line.bucket;
    let s = state.get(where);
    if (!s) state.set(where, (s = { pilotSeen: false, powerTerminal: false, cptSeen: false, cptFuse: 0, cptHolder: 0 }));
    if (line.category === 'pilot-device') s.pilotSeen = true;
    if (line.category === 'control-transformer') {
      s.cptSeen = true;
      continue;
    }
    const type = sccrTypeForCatalogueCategory(line.category);
    if (!type) continue;
    const skip = (reason: string) =>
      excluded.push({ location: where === PANEL_BUCKET ? 'feeder' : where, code: line.code, description: line.description, reason });
    if (where === PANEL_BUCKET) {
      if (s.cptSeen && (type === 'fuse' || type === 'fuse-holder')) {
        const n = type === 'fuse' ? s.cptFuse++ : s.cptHolder++;
        if (n > 0) {
          skip('control transformer secondary: control circuit, not in the power-circuit rating');
          continue;
        }
      }
      feeder.push(component(line, type));
      continue;
    }
    if ((type === 'fuse' || type === 'fuse-holder') && s.pilotSeen) {
      skip('control-circuit fuse on the transformer secondary: not in the power-circuit rating');
      continue;
    }
    if (type === 'terminal-block') {
      const item = line.code ? byCode.get(line.code) : undefined;
      if (item?.ratings.kind === 'ground') {
        skip('ground terminal: carries no line current');
        continue;
      }
      if (s.powerTerminal) {
        skip('control-circuit terminals: not in the power-circuit rating');
        continue;
      }
      s.powerTerminal = true;
    }
    let list = buckets.get(where);
    if (!list) buckets.set(where, (list = []));
    list.push(component(line, type));
  }
  return { feeder, buckets, excluded };
}

/** The SCCR worksheet's input from a bill of materials, the catalogue, the selections and the tested combinations. */
export function sccrInputFor(
  lines: readonly BomLine[],
  byCode: ReadonlyMap<string, CatalogueItem>,
  selections: readonly LoadSelection[],
  combinations: SccrInput['combinations'],
  availableFaultKa: number | null,
) {
  const bySel = new Map(selections.map((s) => [s.tag, s]));
  const parts = sccrComponents(lines, byCode);
  const buckets: SccrBucketInput[] = [...parts.buckets.entries()].map(([tag, components]) => ({
    tag,
    hp: bySel.get(tag)?.hp ?? null,
    volts: bySel.get(tag)?.volts,
    components,
  }));
  const feederHp = selections.reduce((s, x) => s + (x.hp ?? 0), 0);
  const input: SccrInput = { feeder: parts.feeder, feederHp: feederHp > 0 ? feederHp : null, buckets, combinations, availableFaultKa };
  return { input, parts };
}
