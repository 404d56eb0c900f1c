// The engineer's panel checks: the panel, its motors, the catalogue, the tested combinations and the shop
// read through the repositories, the one bill of materials from the bom module (its stored lines, or with
// none stored the lines its rebuild would store, built in memory: never written here), and the pure
// calculation of shared/calc/checks. Four or five queries whatever the motor count.
import type { CurrentUser } from '../../../shared/schemas/auth';
import type { BomLine, CatalogueItem } from '../../../shared/schemas/catalogue';
import type { PanelChecks } from '../../../shared/schemas/checks';
import type { LoadSelection, PanelRollup } from '../../../shared/schemas/selection';
import type { ShopSettings } from '../../../shared/schemas/settings';
import { calculatePanelSccr, type SccrResult } from '../../../shared/calc/sccr';
import { sccrInputFor } from '../../../shared/calc/checks/sccr-components';
import { checkedSelections, panelChecks as calculateChecks } from '../../../shared/calc/checks/panel-checks';
import { catalogueFor } from '../catalogue/repository';
import { activeCombinations } from '../catalogue/combinations';
import { loadsOf } from '../panels/repository';
import { loadView, requirePanel } from '../panels/service';
import { currentBom, panelEnclosureType } from '../bom/service';
import { shopSettingsOf } from '../settings/service';
import type { Panel } from '../../db/models/panel';
import type { Job } from '../../db/models/job';

// the motor list and the change report show the same cautions (they import them from here)

export interface ChecksContext {
  checks: PanelChecks;
  /** the effective selections without errors (what the checks used) */
  selections: LoadSelection[];
  rollup: PanelRollup | null;
  panel: Panel & { job: Job };
  shop: ShopSettings;
  /** the bill of materials the checks read (stored, or built in memory) */
  lines: BomLine[];
  /** each motor's answers, in the panel's order */
  answers: Array<Record<string, unknown>>;
  /** the organisation's catalogue by code (what the checks and the backplate layout read the parts from) */
  catalogue: ReadonlyMap<string, CatalogueItem>;
}

/** The panel's SCCR from a given bill of materials (the one a sign-off has just regenerated). */
export async function panelSccrFor(
  organisationId: number,
  lines: readonly BomLine[],
  selections: readonly LoadSelection[],
  availableFaultKa: number | null,
): Promise<SccrResult> {
  const [catalogue, combinations] = await Promise.all([catalogueFor(organisationId), activeCombinations(organisationId)]);
  const byCode = new Map(catalogue.map((c) => [c.code, c]));
  return calculatePanelSccr(sccrInputFor(lines, byCode, selections, combinations, availableFaultKa).input);
}

export async function computeChecks(actor: CurrentUser, panelId: number): Promise<ChecksContext> {
  const panel = await requirePanel(actor, panelId);
  const job = panel.job;
  const [loads, bom, catalogue, combinations, shop] = await Promise.all([
    loadsOf(panel.id),
    currentBom(actor.organisationId, panel),
    catalogueFor(actor.organisationId),
    activeCombinations(actor.organisationId),
    shopSettingsOf(actor.organisationId),
  ]);
  const motors = loads.map(loadView);
  const rollup = (panel.rollup ?? null) as PanelRollup | null;
  const byCode = new Map(catalogue.map((c) => [c.code, c]));
  const checks = calculateChecks({
    panel: { id: panel.id, name: panel.name, mounting: panel.mounting, revisionNumber: panel.revisionNumber, status: panel.status },
    job: {
      id: job.id,
      number: job.number,
      name: job.name,
      customer: job.customer,
      site: job.site,
      supplyVolts: job.supplyVolts,
      supplyPhases: job.supplyPhases,
      supplyHz: job.supplyHz,
      availableFaultKa: job.availableFaultKa,
      ambientC: job.ambientC,
      codeEdition: job.codeEdition,
    },
    motors,
    rollup,
    bom: { ...bom, enclosureType: panelEnclosureType(motors.flatMap((m) => (m.effective ? [m.effective] : []))) },
    catalogue: byCode,
    combinations,
    shopName: shop.name,
  });
  return {
    checks,
    selections: checkedSelections(motors).selections,
    rollup,
    panel,
    shop,
    lines: bom.lines,
    answers: motors.map((l) => l.answers as Record<string, unknown>),
    catalogue: byCode,
  };
}

export async function panelChecks(actor: CurrentUser, panelId: number): Promise<PanelChecks> {
  return (await computeChecks(actor, panelId)).checks;
}
