// A panel's roll-up and its motors' selections again: from the stored selections, or by running the rules again.
import type { Transaction } from 'sequelize';
import type { LoadInput } from '../../../shared/schemas/load';
import * as repo from './repository';
import { panelSupply, rollupOf, selectAll } from '../selection/service';
import type { Panel } from '../../db/models/panel';
import type { Job } from '../../db/models/job';

/** Recomputes the panel roll-up from the motors' stored selections (the rules do not run again). */
export async function refreshRollup(p: Panel & { job: Job }, t: Transaction) {
  const loads = (await repo.loadsOf(p.id, t)).filter((l) => l.selection);
  const rollup = rollupOf(
    panelSupply(p),
    loads.map((l) => l.answers),
    loads.map((l) => l.selection!),
  ); // filtered above
  p.rollup = rollup;
  p.changed('rollup', true);
}

/**
 * Runs the rules again for every motor of a panel (the job's supply, ambient or code edition changed)
 * and stores the new selections and roll-up, in the caller's transaction.
 */
export async function reselectPanel(p: Panel & { job: Job }, t: Transaction) {
  const loads = await repo.loadsOf(p.id, t);
  const out = await selectAll(
    panelSupply(p),
    loads.map((l) => l.answers as LoadInput),
  );
  if (out) {
    await repo.saveLoads(
      loads.map((l, i) => ({ ...l.get({ plain: true }), selection: out.results[i], version: l.version + 1 })),
      t,
      ['selection', 'version', 'updatedAt'],
    );
  }
  p.rollup = out ? out.panel : null;
  p.changed('rollup', true);
}
