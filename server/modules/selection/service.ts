// The stored truth of a panel's selections: the same shared selector the browser previews with,
// run on the server over the repository's rule files.
import { getSelector } from '../../engine/rule-files';
import type { LoadInput } from '../../../shared/schemas/load';
import type { LoadSelection, SelectionOutput } from '../../../shared/schemas/selection';
import type { CodeEdition } from '../../../shared/standards/code-edition';
import { jobSupply, type JobSummary, type JobSupplyFields } from '../../../shared/schemas/job';
import type { PanelRollup } from '../../../shared/schemas/selection';

export type JobSupply = JobSupplyFields & Pick<JobSummary, 'codeEdition'>;

/** The supply a panel's motors are selected on: its job's supply and the panel's own answers (terminations, 110.14(C)(1)). */
export function panelSupply(p: { job: JobSupply; terminationsListed75C?: boolean | null }): JobSupply {
  const j = p.job;
  return {
    supplyVolts: j.supplyVolts,
    supplyPhases: j.supplyPhases,
    supplyHz: j.supplyHz,
    availableFaultKa: j.availableFaultKa,
    ambientC: j.ambientC,
    voltageUnbalancePercent: j.voltageUnbalancePercent,
    codeEdition: j.codeEdition,
    terminationsListed75C: p.terminationsListed75C ?? null,
  };
}

function edition(job: JobSupply): CodeEdition {
  return (job.codeEdition === '2020' ? '2020' : '2023') as CodeEdition;
}

export async function selectOne(job: JobSupply, answers: LoadInput): Promise<LoadSelection> {
  return getSelector(edition(job)).selectLoad(answers, jobSupply(job));
}

/** The panel roll-up from the stored selections: no rules run again. */
export function rollupOf(job: JobSupply, answers: LoadInput[], selections: LoadSelection[]): PanelRollup | null {
  if (answers.length === 0) return null;
  return getSelector(edition(job)).panelRollup(jobSupply(job), answers, selections);
}

export async function selectAll(job: JobSupply, answers: LoadInput[]): Promise<SelectionOutput | null> {
  if (answers.length === 0) return null;
  return getSelector(edition(job)).selectPanel({ supply: jobSupply(job), loads: answers });
}
