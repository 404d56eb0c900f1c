// What the panel submittal shows, as the submittal route gathers it, and how the PDF is written.
import type { LoadSelection, PanelRollup } from '../../../shared/schemas/selection';
import type { SccrResult } from '../../../shared/calc/sccr';
import type { HeatResult } from '../../../shared/calc/heat';
import type { ControlPowerResult } from '../../../shared/calc/control-power';
import type { NameplateResult } from '../../../shared/calc/nameplate';
import type { ConnectionCard } from '../../../shared/calc/connections';
import type { ControlConductorCheck } from '../../../shared/calc/control-conductors';
import type { SubmittalDrawings } from './drawing-pages';

export interface SubmittalData {
  job: {
    number: string;
    name: string;
    customer: string;
    site: string;
    availableFaultKa: number | null;
    ambientC: number;
    codeEdition: string;
  };
  /** `revision` as the reader sees it ("R1", "Draft after R0"); `revisionCode` for the drawing number ("R1", or "D" for a draft) */
  panel: { name: string; revision: string; revisionCode?: string /** ISO date */; date: string; enclosureType: string };
  /** the shop that issues the submittal (shop settings) */
  shop: { name: string; address?: string /** PNG or JPEG */; logo?: Buffer | null; drawingNumberScheme: string };
  selections: LoadSelection[];
  rollup: PanelRollup;
  nameplate: NameplateResult;
  sccr: SccrResult;
  /** the signed-off revision this submittal shows, with the engineer's acknowledgement of a rating below the site's fault current */
  signOff?: {
    revision: string;
    date: string /** the engineer who signed */;
    by?: string | null;
    acknowledged: { finding: string; by: string; reason: string } | null;
  };
  heat: HeatResult;
  controlPower: ControlPowerResult;
  /** each control conductor against its protecting device (430.72(B)) */
  controlConductors?: ControlConductorCheck;
  connectionCards: Array<{ tag: string; card: ConnectionCard }>;
  /** schematics, terminal plan and panel marking (drawing-pages.ts) */
  drawings?: SubmittalDrawings;
}

export interface SubmittalPdfOptions {
  /** false writes uncompressed content streams (tests read the text) */
  compress?: boolean;
  /** Barlow (embedded from @fontsource/barlow WOFF files) by default; Helvetica when asked or when missing */
  font?: 'barlow' | 'helvetica';
}
