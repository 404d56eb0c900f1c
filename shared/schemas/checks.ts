// The answer of GET /api/panels/:panelId/checks: the engineer's panel checks, as the server builds them and
// the client reads them.
import type { SccrResult } from '../calc/sccr';
import type { EnclosureMounting, HeatResult } from '../calc/heat';
import type { ControlPowerResult } from '../calc/control-power';
import type { NameplateResult } from '../calc/nameplate';
import type { ConnectionCard } from '../calc/connections';
import type { SourcesSummary } from '../calc/other-sources';
import type { ControlConductorCheck } from '../calc/control-conductors';
import type { SharedDrive } from './selection';
import type { GroupCircuit } from './group-circuit';

export interface ExcludedComponent {
  location: string;
  code: string | null;
  description: string;
  reason: string;
}

export interface SccrCheck extends SccrResult {
  /** parts of the bill of materials left out of the power-circuit worksheet, with the reason */
  excluded: ExcludedComponent[];
}

export interface HeatCheck {
  result: HeatResult | null;
  enclosure: null | {
    code: string | null;
    description: string;
    heightMm: number;
    widthMm: number;
    depthMm: number;
    sections: number;
    mounting: EnclosureMounting;
  };
  reason: string | null;
}

export interface ControlPowerCheck {
  result: ControlPowerResult | null;
  /** the transformer in the bill of materials, and whether it is at least the size needed */
  fitted: null | { code: string | null; description: string; va: number | null; adequate: boolean | null };
  basis: string;
  reason: string | null;
}

export interface NameplateCheck {
  result: NameplateResult | null;
  reason: string | null;
}

export interface MotorConnectionCard {
  loadId: number;
  tag: string;
  card: ConnectionCard | null;
  /** what the card takes for granted that the answers do not say */
  assumptions: string[];
  /** why there is no card */
  reason: string | null;
}

/** Motors on one branch circuit (430.53): the groups and the findings on them. */
export interface GroupCircuitCheck {
  groups: GroupCircuit[];
  findings: string[];
  basis: string;
}

export interface PanelChecks {
  panel: { id: number; name: string; mounting: string; enclosureType: string; revision: string };
  job: {
    id: number;
    number: string;
    name: string;
    customer: string;
    site: string;
    supplyVolts: number;
    supplyPhases: number;
    supplyHz: number;
    availableFaultKa: number;
    ambientC: number;
    codeEdition: string;
  };
  bom: { source: 'stored' | 'in-memory'; stale: boolean; unmatchedLines: number; note: string | null };
  /** motors left out of the checks because their selection has errors */
  motorsWithErrors: string[];
  sccr: SccrCheck;
  heat: HeatCheck;
  controlPower: ControlPowerCheck;
  nameplate: NameplateCheck;
  /** motors at another voltage than the supply: the transformers and DC supplies in the panel, and the motors fed from outside it */
  otherSources: SourcesSummary;
  /** drives feeding several motors: the drive for the sum, each motor's overload, contactor and conductors (absent in checks made before) */
  sharedDrives?: SharedDriveCheck;
  /** every control conductor against its protecting device (430.72(A), (B), Table 430.72(B)) */
  controlConductors: ControlConductorCheck;
  /** motors on one branch circuit (430.53); absent in answers built before it existed */
  groupCircuits?: GroupCircuitCheck;
  connectionCards: MotorConnectionCard[];
  cautions: string[];
}

/** The panel's shared drives with their sums and cautions, a line in words for each, and what kept a motor off its drive. */
export interface SharedDriveCheck {
  drives: SharedDrive[];
  lines: string[];
  errors: string[];
}

/** The cautions every check result carries (the checks page, the submittal, the motor list, the change report). */
export const CHECK_CAUTIONS = [
  'Results support, not replace, a qualified person’s design; a qualified person verifies them.',
  'Local codes, the authority having jurisdiction, and the listing and instructions of the equipment take precedence.',
  'De-energise and lock out before work. Check motor rotation before coupling the load.',
];
