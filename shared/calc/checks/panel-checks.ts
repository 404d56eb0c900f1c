// The engineer's panel checks as one pure calculation on plain data: the panel, its job's supply, the
// motors' effective selections (overrides applied), the roll-up, the one bill of materials the bom module
// built (stored, or planned in memory), the catalogue and the tested combinations. SCCR worksheet (UL 508A
// SB4, NEC 409.22), heat load (IEC TR 60890 simplified), control power transformer (NEC 430.72(C), 450.3(B)),
// control-circuit conductors (430.72(A), (B)), nameplate and feeder (NEC 409.110, 409.21), the sources at
// other voltages, and each motor's lead connection card.
import type { BomLine, CatalogueItem } from '../../schemas/catalogue';
import type { PanelChecks } from '../../schemas/checks';
import type { LoadSelection, PanelRollup } from '../../schemas/selection';
import { controlConductorChecks } from '../control-conductors';
import { sourcesSummary } from '../other-sources';
import type { SccrInput } from '../sccr';
import { CHECK_CAUTIONS } from '../../schemas/checks';
import { motorConnectionCard } from './connection-card';
import { controlPowerCheck } from './control-power-check';
import { groupCircuitCheck } from './group-check';
import { heatCheck } from './heat-check';
import { nameplateCheck } from './nameplate-check';
import { sccrCheck } from './sccr-check';
import { sharedDriveCheck } from './shared-drive-check';

/** A motor of the panel: its answers and its effective selection (null before one is made). */
export interface CheckedMotor {
  id: number;
  tag: string;
  answers: Record<string, unknown>;
  effective: LoadSelection | null;
}

/** The bill of materials the checks read, as the bom module gives it. */
export interface ChecksBom {
  lines: readonly BomLine[];
  /** stored lines, or the lines a rebuild would store built in memory (not saved) */
  source: 'stored' | 'in-memory';
  /** stored lines a rebuild now would change (other parts or quantities) */
  stale: boolean;
  /** the panel's enclosure type (the most protective of its buckets) */
  enclosureType: string;
}

export interface PanelChecksInput {
  panel: { id: number; name: string; mounting: string; revisionNumber: number | null; status: string };
  job: PanelChecks['job'];
  motors: readonly CheckedMotor[];
  rollup: PanelRollup | null;
  bom: ChecksBom;
  /** the organisation's catalogue by part code */
  catalogue: ReadonlyMap<string, CatalogueItem>;
  combinations: SccrInput['combinations'];
  shopName: string;
}

/** The effective selections without errors (what the checks use), and the motors left out. */
export function checkedSelections(motors: readonly CheckedMotor[]): { selections: LoadSelection[]; motorsWithErrors: string[] } {
  return {
    selections: motors.flatMap((m) => (m.effective && m.effective.errors.length === 0 ? [m.effective] : [])),
    motorsWithErrors: motors.filter((m) => !m.effective || m.effective.errors.length > 0).map((m) => m.tag),
  };
}

export function revisionText(p: { revisionNumber: number | null; status: string }): string {
  if (p.revisionNumber === null) return 'Draft (no signed-off revision)';
  return p.status === 'signed_off' ? `R${p.revisionNumber}` : `Draft after R${p.revisionNumber}`;
}

function bomNote(bom: ChecksBom): string | null {
  if (bom.source === 'in-memory')
    return 'No bill of materials is stored yet: the checks use one built from the catalogue for this view (not saved).';
  return bom.stale
    ? 'The motors, their overrides or the catalogue changed since the stored bill of materials was built: rebuild it for current checks.'
    : null;
}

export function panelChecks(input: PanelChecksInput): PanelChecks {
  const { panel, job, rollup, bom, catalogue } = input;
  const { lines, enclosureType } = bom;
  const { selections, motorsWithErrors } = checkedSelections(input.motors);
  const bySel = new Map(selections.map((s) => [s.tag, s]));
  const sccr = sccrCheck({
    lines,
    catalogue,
    selections,
    combinations: input.combinations,
    supply: { volts: job.supplyVolts, phases: job.supplyPhases, availableFaultKa: job.availableFaultKa ?? null },
    rollup,
  });
  return {
    panel: { id: panel.id, name: panel.name, mounting: panel.mounting, enclosureType, revision: revisionText(panel) },
    job,
    bom: {
      source: bom.source,
      stale: bom.source === 'stored' && bom.stale,
      unmatchedLines: lines.filter((l) => l.status === 'unmatched').length,
      note: bomNote(bom),
    },
    motorsWithErrors,
    sccr,
    heat: heatCheck(lines, catalogue, bySel, panel.mounting, job.ambientC),
    controlPower: controlPowerCheck(lines, catalogue, job.supplyVolts),
    controlConductors: controlConductorChecks(lines, catalogue, selections),
    groupCircuits: groupCircuitCheck(rollup, lines),
    nameplate: nameplateCheck(rollup, job, sccr.panelSccrKa, enclosureType, input.shopName),
    otherSources: sourcesSummary(rollup),
    sharedDrives: sharedDriveCheck(rollup),
    connectionCards: input.motors.map((m) => motorConnectionCard(m.id, m.answers, m.effective)),
    cautions: CHECK_CAUTIONS,
  };
}
