// Shared set-up for the engine tests: the repository's rules, loaded once.
import { createSelector } from '../../../shared/engine/selector';
import type { LoadInput, SupplyInput } from '../../../shared/schemas/load';
import { loadRuleFiles } from '../../../server/engine/rule-files';

export const ruleFiles = loadRuleFiles();
export const selector = createSelector(ruleFiles);
export const selector2020 = createSelector(ruleFiles, { codeEdition: '2020' });

export const supply480: SupplyInput = { volts: 480, phases: 3, hz: 60, availableFaultKa: 35, ambientC: 30 };
export const supply240: SupplyInput = { volts: 240, phases: 3, hz: 60, availableFaultKa: 22, ambientC: 30 };

export function motor(over: Partial<LoadInput>): LoadInput {
  return { tag: 'M-1', supply: 'ac3', hp: 10, volts: 460, environment: 'indoor-dusty', ...over } as LoadInput;
}
