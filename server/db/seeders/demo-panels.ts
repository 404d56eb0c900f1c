import type { Transaction } from 'sequelize';

/** Demo panels and motors (filled in with the panels module). */
export async function seedDemoPanels(_organisationId: number, _jobId: number, _transaction: Transaction) {}
