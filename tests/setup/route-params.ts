// Values for the :params of API paths in the role matrix: a job, panel and motor made for the
// matrix in the demo organisation, so that allowed calls never touch the demo data other tests read.
import { Job } from '../../server/db/models/job';
import { User } from '../../server/db/models/user';
import { Panel } from '../../server/db/models/panel';
import { Load } from '../../server/db/models/load';
import { Organisation } from '../../server/db/models/organisation';
import { DEMO_ORGANISATION } from '../../server/db/seeders/demo';
import { selectOne } from '../../server/modules/selection/service';
import { CatalogueItem } from '../../server/db/models/catalogue-item';
import { BomLineRow } from '../../server/db/models/bom-line';
import { CombinationRatingRow } from '../../server/db/models/combination-rating';

export async function paramValues(): Promise<Record<string, string>> {
  const org = await Organisation.findOne({ where: { name: DEMO_ORGANISATION } });
  const organisationId = org!.id;
  const job = await Job.create({
    organisationId,
    number: `RM-${Date.now().toString(36)}`,
    name: 'Role matrix job',
    archivedAt: null,
    createdBy: null,
  });
  const user = await User.findOne({ where: { organisationId, email: 'estimator@copperline.test' } });
  const panel = await Panel.create({
    organisationId,
    jobId: job.id,
    name: 'Role matrix panel',
    revisionNumber: null,
    archivedAt: null,
    rollup: null,
    submittedAt: null,
  });
  const answers = { tag: 'RM-1', supply: 'ac3' as const, hp: 10, volts: 460 };
  const load = await Load.create({
    organisationId,
    panelId: panel.id,
    tag: 'RM-1',
    answers,
    selection: await selectOne(job, answers),
    overrides: [],
  });
  const item = await CatalogueItem.create({
    organisationId,
    code: `RM-ITEM-${Date.now().toString(36).toUpperCase()}`,
    category: 'fuse',
    description: 'Role matrix fuse',
    ratings: { volts: 600, amps: 10, fuseClass: 'CC', timeDelay: true },
    sccrKa: null,
    unitCost: 5,
    active: false,
  });
  const line = await BomLineRow.create({
    organisationId,
    panelId: panel.id,
    position: 0,
    line: {
      bucket: '(panel)',
      category: 'freight',
      code: null,
      description: 'Role matrix freight',
      quantity: 1,
      unit: 'ea',
      unitCost: 10,
      unitLabourHours: 0,
      heatLossW: 0,
      sccrKa: null,
      status: 'manual',
      requiredRatings: null,
      source: 'manual',
      swapReason: null,
    },
  });
  const combination = await CombinationRatingRow.create({
    organisationId,
    ref: `RM-CMB-${Date.now().toString(36)}`,
    componentCodes: [item.code, 'PW-CN-N1-120'],
    ratingKa: 5,
    maxVolts: null,
    source: 'Role matrix combination',
    active: false,
  });
  return {
    id: String(job.id),
    userId: String(user!.id),
    panelId: String(panel.id),
    loadId: String(load.id),
    number: '0',
    itemId: String(item.id),
    lineId: String(line.id),
    key: 'termination',
    combinationId: String(combination.id),
  };
}
