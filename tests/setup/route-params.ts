// Values for the :params of API paths in the role matrix: a job, panel and motor made for the
// matrix in the demo organisation, so that allowed calls never touch the demo data other tests read.
import { Job } from '../../server/db/models/job';
import { User } from '../../server/db/models/user';
import { Panel } from '../../server/db/models/panel';
import { Load } from '../../server/db/models/load';
import { Organisation } from '../../server/db/models/organisation';
import { DEMO_ORGANISATION } from '../../server/db/seeders/demo';
import { selectOne } from '../../server/modules/panels/selection';

export async function paramValues(): Promise<Record<string, string>> {
  const org = await Organisation.findOne({ where: { name: DEMO_ORGANISATION } });
  const organisationId = org!.id;
  const job = await Job.create({ organisationId, number: `RM-${Date.now().toString(36)}`, name: 'Role matrix job', archivedAt: null, createdBy: null });
  const user = await User.findOne({ where: { organisationId, email: 'estimator@copperline.test' } });
  const panel = await Panel.create({ organisationId, jobId: job.id, name: 'Role matrix panel', revisionNumber: null, archivedAt: null, rollup: null, submittedAt: null });
  const answers = { tag: 'RM-1', supply: 'ac3' as const, hp: 10, volts: 460 };
  const load = await Load.create({ organisationId, panelId: panel.id, tag: 'RM-1', answers, selection: (await selectOne(job, answers)) as unknown as Record<string, unknown>, overrides: [] });
  return { id: String(job.id), userId: String(user!.id), panelId: String(panel.id), loadId: String(load.id), number: '0' };
}
