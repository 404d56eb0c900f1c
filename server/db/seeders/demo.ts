// Demo data for an invented scenario: a fictional panel shop building panels for a fictional
// water-treatment plant. No real company, person or product.
import argon2 from 'argon2';
import type { Sequelize } from 'sequelize';
import { Organisation } from '../models/organisation';
import { User } from '../models/user';
import { Job } from '../models/job';
import { seedCatalogue } from './catalogue';
import { seedDemoPanels } from './demo-panels';

export const DEMO_USERS = [
  { email: 'admin@copperline.test', name: 'Ada Quarry', roles: ['admin'], password: 'demo-admin-pass-1' },
  { email: 'designer@copperline.test', name: 'Dev Halloran', roles: ['designer'], password: 'demo-designer-pass-1' },
  { email: 'estimator@copperline.test', name: 'Esme Tolliver', roles: ['estimator'], password: 'demo-estimator-pass-1' },
  { email: 'engineer@copperline.test', name: 'Ines Markham', roles: ['engineer'], password: 'demo-engineer-pass-1' },
] as const;

export const DEMO_ORGANISATION = 'Copperline Panel Works (demo)';

/** Seeds once: does nothing when an organisation exists. Returns whether it seeded. */
export async function seedDemo(sequelize: Sequelize): Promise<boolean> {
  if ((await Organisation.count()) > 0) return false;
  await sequelize.transaction(async (transaction) => {
    const org = await Organisation.create({ name: DEMO_ORGANISATION }, { transaction });
    const users: User[] = [];
    for (const u of DEMO_USERS) {
      users.push(
        await User.create(
          {
            organisationId: org.id,
            email: u.email,
            name: u.name,
            roles: [...u.roles],
            passwordHash: await argon2.hash(u.password),
            inviteToken: null,
            lastSignInAt: null,
          },
          { transaction },
        ),
      );
    }
    const designer = users[1];
    const job = await Job.create(
      {
        organisationId: org.id,
        number: 'J-2041',
        name: 'Raw water pump station upgrade',
        customer: 'Kestrel Flats Water District (fictional)',
        site: 'Kestrel Flats treatment plant, pump hall 2',
        supplyVolts: 480,
        supplyPhases: 3,
        supplyHz: 60,
        availableFaultKa: 35,
        ambientC: 35,
        codeEdition: '2023',
        notes: 'Demo job. Utility limits starting inrush on the 150 hp pumps.',
        archivedAt: null,
        createdBy: designer.id,
      },
      { transaction },
    );
    await Job.create(
      {
        organisationId: org.id,
        number: 'J-2042',
        name: 'Sludge press room MCC',
        customer: 'Kestrel Flats Water District (fictional)',
        site: 'Solids handling building',
        supplyVolts: 480,
        supplyPhases: 3,
        supplyHz: 60,
        availableFaultKa: 22,
        ambientC: 30,
        codeEdition: '2023',
        notes: '',
        archivedAt: null,
        createdBy: designer.id,
      },
      { transaction },
    );
    await seedCatalogue(org.id, transaction);
    await seedDemoPanels(org.id, job.id, transaction);
  });
  return true;
}
