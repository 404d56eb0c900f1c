// The panel's groups of motors on one branch circuit (NEC 430.53) as the engineer reviews them: each
// group's path, device, conductor and taps from the roll-up, and a finding for each group no path allows
// or whose device the bill of materials does not carry.
import type { BomLine } from '../../schemas/catalogue';
import type { GroupCircuitCheck } from '../../schemas/checks';
import type { PanelRollup } from '../../schemas/selection';

const DEVICE_CATEGORIES = new Set(['inverse-time-breaker', 'fuse']);

export function groupCircuitCheck(rollup: PanelRollup | null, lines: readonly BomLine[]): GroupCircuitCheck {
  const groups = rollup?.groups ?? [];
  const findings: string[] = [];
  for (const g of groups) {
    if (g.refusal !== null) {
      findings.push(`${g.group} (${g.motors.join(', ')}): refused — ${g.refusal}. Each motor keeps its own branch device until fixed.`);
      continue;
    }
    const carried = lines.some((l) => l.bucket === g.group && DEVICE_CATEGORIES.has(l.category));
    if (!carried) findings.push(`${g.group}: the bill of materials has no group device yet: rebuild it.`);
  }
  return {
    groups,
    findings,
    basis: 'NEC 430.53(A), (B), (C), (D), 430.17, 430.24, Table 430.52, Table 240.6(A)',
  };
}
