import type { Transaction } from 'sequelize';

/** Loads catalog/*.json into the organisation's catalogue (filled in with the catalogue module). */
export async function seedCatalogue(_organisationId: number, _transaction: Transaction) {}
