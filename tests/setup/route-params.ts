// Values for the :params of API paths in the role matrix, taken from the seeded demo organisation.
import { Job } from '../../server/db/models/job';
import { User } from '../../server/db/models/user';
import { Organisation } from '../../server/db/models/organisation';
import { DEMO_ORGANISATION } from '../../server/db/seeders/demo';

export async function paramValues(): Promise<Record<string, string>> {
  const org = await Organisation.findOne({ where: { name: DEMO_ORGANISATION } });
  const job = await Job.findOne({ where: { organisationId: org!.id }, order: [['id', 'ASC']] });
  const user = await User.findOne({ where: { organisationId: org!.id, email: 'estimator@copperline.test' } });
  return { id: String(job!.id), userId: String(user!.id) };
}
