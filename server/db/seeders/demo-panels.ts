// Demo panels for the fictional raw-water pump station: motors with their engine selections.
import type { Transaction } from 'sequelize';
import { Panel } from '../models/panel';
import { Load } from '../models/load';
import { Job } from '../models/job';
import type { LoadInput } from '../../../shared/schemas/load';
import { selectAll } from '../../modules/selection/service';
import { regenerateBom } from '../../modules/bom/service';

export const DEMO_MOTORS: LoadInput[] = [
  {
    tag: 'P-101',
    description: 'Raw water pump 1',
    supply: 'ac3',
    hp: 150,
    volts: 460,
    fla: 172,
    serviceFactor: 1.15,
    codeLetter: 'G',
    design: 'B',
    startingLimit: 'reduced-inrush',
    critical: true,
    environment: 'indoor-dusty',
    inertia: 'normal',
  },
  {
    tag: 'P-102',
    description: 'Raw water pump 2',
    supply: 'ac3',
    hp: 150,
    volts: 460,
    fla: 172,
    serviceFactor: 1.15,
    codeLetter: 'G',
    design: 'B',
    startingLimit: 'reduced-inrush',
    critical: true,
    environment: 'indoor-dusty',
  },
  {
    tag: 'P-110',
    description: 'Wash water pump (variable flow)',
    supply: 'ac3',
    hp: 40,
    volts: 460,
    fla: 48,
    serviceFactor: 1.15,
    speedControl: 'variable',
    turndown: 4,
    torque: 'variable',
    environment: 'indoor-dusty',
    cableLengthFt: 180,
  },
  {
    tag: 'C-201',
    description: 'Screenings conveyor',
    supply: 'ac3',
    hp: 7.5,
    volts: 460,
    fla: 10.2,
    serviceFactor: 1.15,
    reversing: true,
    reverseRotationHazard: true,
    environment: 'washdown',
  },
  {
    tag: 'K-301',
    description: 'Blower, screw compressor',
    supply: 'ac3',
    hp: 60,
    volts: 460,
    fla: 70,
    serviceFactor: 1.15,
    reverseRotationHazard: true,
    inertia: 'high',
    leads: 6,
    connection: 'delta',
    startingLimit: 'reduced-inrush',
    starterPreference: 'wye-delta',
    environment: 'indoor-dusty',
  },
  {
    tag: 'M-401',
    description: 'Sampling pump',
    supply: 'ac1',
    hp: 0.5,
    volts: 115,
    singlePhaseType: 'capacitor-start',
    environment: 'indoor-dry',
  },
  {
    tag: 'V-501',
    description: 'Sluice gate actuator',
    supply: 'ac3',
    hp: 2,
    volts: 460,
    reversing: true,
    duty: 'intermittent',
    jogging: true,
    environment: 'outdoor',
  },
  {
    tag: 'H-601',
    description: 'Chemical room hoist (DC)',
    supply: 'dc',
    hp: 5,
    volts: 240,
    dcField: 'compound',
    reversing: true,
    quickStop: true,
    environment: 'corrosive',
  },
];

export async function seedDemoPanels(organisationId: number, jobId: number, transaction: Transaction) {
  const job = await Job.findByPk(jobId, { transaction });
  if (!job) return;
  const out = await selectAll(job, DEMO_MOTORS);
  const panel = await Panel.create(
    {
      organisationId,
      jobId,
      name: 'MCC-1 Pump hall',
      description: 'Main motor-control panel of pump hall 2',
      mounting: 'free-standing',
      revisionNumber: null,
      archivedAt: null,
      rollup: out ? out.panel : null,
      submittedAt: null,
    },
    { transaction },
  );
  await Load.bulkCreate(
    DEMO_MOTORS.map((answers, i) => ({
      organisationId,
      panelId: panel.id,
      tag: answers.tag,
      position: i + 1,
      answers,
      selection: out!.results[i],
      overrides: [],
    })),
    { transaction },
  );
  // the demo panel opens with its bill of materials built from the seeded catalogue
  await regenerateBom(organisationId, Object.assign(panel, { job }), transaction);
}
