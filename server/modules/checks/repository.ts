import { BomLineRow } from '../../db/models/bom-line';
import type { BomLine } from '../../../shared/schemas/catalogue';

/** The panel's stored bill-of-materials lines in their order (one query). */
export async function storedBomLines(organisationId: number, panelId: number): Promise<BomLine[]> {
  const rows = await BomLineRow.findAll({ where: { organisationId, panelId }, order: [['position', 'ASC'], ['id', 'ASC']] });
  return rows.map((r) => r.line);
}
