// The stored truth of a panel's selections: the same shared selector the browser previews with,
// run on the server over the repository's rule files.
import { getSelector } from '../../engine/rule-files';
import type { LoadInput, SupplyInput } from '../../../shared/schemas/load';
import type { LoadSelection, SelectionOutput } from '../../../shared/schemas/selection';
import type { CodeEdition } from '../../../shared/standards/code-edition';

export interface JobSupply {
  supplyVolts: number;
  supplyPhases: number;
  supplyHz: number;
  availableFaultKa: number;
  ambientC: number;
  codeEdition: string;
}

export function supplyOf(job: JobSupply): SupplyInput {
  return {
    volts: job.supplyVolts,
    phases: job.supplyPhases as 1 | 3,
    hz: job.supplyHz as 50 | 60,
    availableFaultKa: job.availableFaultKa,
    ambientC: job.ambientC,
  };
}

function edition(job: JobSupply): CodeEdition {
  return (job.codeEdition === '2020' ? '2020' : '2023') as CodeEdition;
}

export async function selectOne(job: JobSupply, answers: LoadInput): Promise<LoadSelection> {
  return getSelector(edition(job)).selectLoad(answers, supplyOf(job));
}

export async function selectAll(job: JobSupply, answers: LoadInput[]): Promise<SelectionOutput | null> {
  if (answers.length === 0) return null;
  return getSelector(edition(job)).selectPanel({ supply: supplyOf(job), loads: answers });
}
