// The control power transformer of the panel checks (NEC 430.72(C), 450.3(B), shared/calc/control-power):
// the control loads of the bill of materials against the transformer fitted.
import type { BomLine, CatalogueItem } from '../../schemas/catalogue';
import type { ControlPowerCheck } from '../../schemas/checks';
import { sizeControlTransformer } from '../control-power';
import { round2 } from '../round';

/** Control circuit voltage of the panel (the bill of materials' default). */
export const CONTROL_VOLTS = 120;

/** Sealed VA and the largest coil inrush of the control loads in the lines, as the bill of materials counts them. */
export function controlLoads(lines: readonly BomLine[], byCode: ReadonlyMap<string, CatalogueItem>) {
  let sealedVa = 0;
  let largestInrushVa = 0;
  let coils = 0;
  let lights = 0;
  let relays = 0;
  for (const l of lines) {
    const item = l.code ? byCode.get(l.code) : undefined;
    if (!item) continue;
    if (l.category === 'contactor') {
      const va = l.quantity * (item.ratings.sealedVa ?? 0);
      sealedVa += va;
      coils += va;
      largestInrushVa = Math.max(largestInrushVa, item.ratings.inrushVa ?? 0);
    } else if (l.category === 'pilot-device' && item.ratings.va) {
      sealedVa += l.quantity * item.ratings.va;
      lights += l.quantity * item.ratings.va;
    } else if (l.category === 'phase-monitor-relay' && item.ratings.va) {
      sealedVa += l.quantity * item.ratings.va;
      relays += l.quantity * item.ratings.va;
    }
  }
  return { sealedVa: round2(sealedVa), largestInrushVa, coilsVa: round2(coils), lightsVa: round2(lights), relaysVa: round2(relays) };
}

export function controlPowerCheck(
  lines: readonly BomLine[],
  byCode: ReadonlyMap<string, CatalogueItem>,
  primaryVolts: number,
): ControlPowerCheck {
  const c = controlLoads(lines, byCode);
  const basis =
    'Sealed VA of contactor coils, pilot lights and relays from the catalogue; inrush of the largest coil (one coil pulls in at a time, common practice).';
  const cptLine = lines.find((l) => l.category === 'control-transformer');
  const cptItem = cptLine?.code ? byCode.get(cptLine.code) : undefined;
  try {
    const result = sizeControlTransformer({
      loads: [
        { description: 'contactor coils (sealed)', kind: 'coil', sealedVa: c.coilsVa },
        { description: 'pilot lights', kind: 'pilot-light', sealedVa: c.lightsVa },
        { description: 'protective relays', kind: 'relay', sealedVa: c.relaysVa },
        { description: 'largest coil pulling in', kind: 'coil', sealedVa: 0, inrushVa: c.largestInrushVa },
      ],
      primaryVolts,
      secondaryVolts: CONTROL_VOLTS,
    });
    const fitted = cptLine
      ? {
          code: cptLine.code,
          description: cptLine.description,
          va: cptItem?.ratings.va ?? null,
          adequate: cptItem?.ratings.va ? cptItem.ratings.va >= result.sizeVa : null,
        }
      : null;
    return { result, fitted, basis, reason: c.sealedVa === 0 ? 'No control loads in the bill of materials.' : null };
  } catch (e) {
    return { result: null, fitted: null, basis, reason: (e as Error).message };
  }
}
