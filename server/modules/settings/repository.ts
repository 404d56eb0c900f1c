import { Organisation } from '../../db/models/organisation';
import type { ShopSettingsInput } from '../../../shared/schemas/settings';

export async function findOrganisation(id: number) {
  return Organisation.findByPk(id);
}

/** Writes the settings when the row still has `version`; the number of rows changed (0: someone else changed it). */
export async function updateSettings(id: number, version: number, values: Partial<ShopSettingsInput & { logoKey: string | null }>) {
  const [count] = await Organisation.update({ ...values, version: version + 1 }, { where: { id, version } });
  return count;
}
