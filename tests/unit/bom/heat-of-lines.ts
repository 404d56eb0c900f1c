// The heat loss of a set of bill-of-materials lines by the one heat model (shared/calc/heat.ts): each line a
// heat source at its catalogue loss, as the panel checks take them.
import { sourceLoss } from '../../../shared/calc/heat';
import type { BomLine } from '../../../shared/schemas/catalogue';

export function linesHeatLossW(lines: readonly BomLine[]): number {
  return lines.reduce(
    (sum, l) =>
      sum +
      sourceLoss({
        bucketTag: l.bucket,
        code: l.code ?? '',
        description: l.description,
        category: l.category,
        qty: l.quantity,
        heatLossW: l.heatLossW,
      }).watts,
    0,
  );
}
