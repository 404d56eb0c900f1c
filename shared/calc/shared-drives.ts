// Several motors on one drive (a multi-motor adjustable-speed drive system), from the motors' answers and
// selections. The motors name the drive by its tag (answer `sharedDrive`); the drive is sized once for them:
// - output: the drive's continuous output current at its duty rating at least the sum of the motors' nameplate
//   FLA (the table FLC where none was given), as shared/calc/drives.ts does for one motor (common practice);
// - input branch circuit: conductors at least 125 % of the drive's rated input current (NEC 430.122(A)); while
//   that is not known, or below it, the sum of the motors' table FLCs (430.6(A)(1)) stands in (common practice);
//   the protective device by Table 430.52 on that current (430.130(A)(1), text from memory), not above the
//   maximum the drive's instructions state (430.130(A)(2));
// - each motor: its own overload relay (430.32(A)(1)), since the drive's electronic overload (430.124(A))
//   follows the drive's total current and protects one motor only; its own output contactor, interlocked with
//   the drive's enable; its own conductors, 125 % of its table FLC (430.22, 430.122(B));
// - the conductors from the drive's output to the taps: 430.24 over the motors they feed (a reading).
// Pure: no Node or DOM.

import type { Load } from '../schemas/load';
import type { LoadSelection, SharedDrive, SharedDriveMotor } from '../schemas/selection';
import { nec, type CodeEdition } from '../standards/code-edition';
import { branchConductor, selectConductor } from './conductor';
import { relayFor } from './overload';
import { round2 } from './round';
import { branchProtection, motorKind } from './scpd';

export interface SharedDriveCandidate {
  load: Load;
  selection: LoadSelection;
  /** on the panel's own bus (not behind a transformer or outside source) */
  onBus: boolean;
}

export interface SharedDriveOptions {
  ambientC: number;
  /** the panel's terminations listed for 75 °C conductors (110.14(C)(1)); true when absent */
  terminationsListed75C?: boolean;
}

export interface SharedDrivesResult {
  drives: SharedDrive[];
  /** tags of the motors a drive of `drives` feeds (the feeder counts their drive, not them) */
  memberTags: Set<string>;
  notes: string[];
  errors: string[];
}

const FILTER_ORDER = ['none', 'dv-dt', 'sine-wave'] as const;

function memberOf(c: SharedDriveCandidate, opts: SharedDriveOptions, edition: CodeEdition): SharedDriveMotor {
  const s = c.selection;
  const relay = relayFor(s);
  const cond = branchConductor(
    {
      flcAmps: s.flcAmps,
      material: c.load.conductor.material,
      tempRatingC: c.load.conductor.tempRatingC,
      ambientC: opts.ambientC,
      terminationsListed75C: opts.terminationsListed75C !== false,
    },
    edition,
  );
  return {
    tag: s.tag,
    flcAmps: s.flcAmps,
    flaAmps: s.flaAmps,
    overload: {
      settingAmps: relay.settingAmps,
      maxSettingAmps: s.overload.maxSettingAmps,
      maxPercent: s.overload.maxPercent,
      tripClass: s.overload.tripClass,
      basis: `${nec(edition, '430.32(A)(1)')}: a relay for this motor alone (the drive's overload does not see one motor's current)`,
    },
    outputContactor: {
      minAc3Amps: round2(s.flaAmps),
      basis: 'AC-3 at the motor FLA, opened and closed only with the drive stopped (common practice)',
    },
    conductor: {
      minAmpacity: cond.minAmpacity,
      size: cond.size,
      ampacity: cond.ampacity,
      material: c.load.conductor.material,
      tempRatingC: c.load.conductor.tempRatingC,
      basis: `${nec(edition, '430.122(B)')}; ${cond.basis}`,
    },
  };
}

/** The cautions of a shared drive, in words for the panel builder and the engineer. */
export function sharedDriveCautions(tag: string, motorTags: readonly string[]): string[] {
  const list = motorTags.join(', ');
  return [
    `${tag} feeds ${list}: each motor has its own overload relay (430.32). The drive's electronic overload follows the drive's total current and protects one motor only: set it for the drive's total or disable it as the drive's instructions say.`,
    `Each output contactor is interlocked with ${tag}'s enable: stop or disable the drive before an output contactor opens or closes. Starting a motor onto a running drive output draws an inrush the drive sees as an overcurrent fault and can damage it; where a motor must start onto the running drive, the drive is sized for it as its maker's instructions say.`,
    `Each motor's conductors are sized for that motor (430.22, 430.122(B)) and are smaller than the drive's output rating: confirm that the drive's listed output protection covers them, or give each motor a protective device suited to a drive output (a reading; the engineer confirms).`,
    `Overload relays on a drive output must suit variable frequency (thermal relays commonly do; check an electronic relay's lowest frequency) — common practice.`,
    `A drive feeding several motors runs in volts-per-hertz control (vector control follows one motor), and its output-filter and cable-length limits count the motors' cables together — common practice; the drive's instructions govern.`,
  ];
}

function driveOf(
  tag: string,
  group: SharedDriveCandidate[],
  opts: SharedDriveOptions,
  edition: CodeEdition,
  errors: string[],
): SharedDrive {
  const motors = group.map((c) => memberOf(c, opts, edition));
  const first = group[0] as SharedDriveCandidate;
  const sumFlcAmps = round2(motors.reduce((n, m) => n + m.flcAmps, 0));
  const sumFlaAmps = round2(motors.reduce((n, m) => n + m.flaAmps, 0));
  const duty = group.some((c) => c.selection.vfd?.duty === 'heavy') ? 'heavy' : 'normal';
  const outputFilter = FILTER_ORDER[Math.max(...group.map((c) => FILTER_ORDER.indexOf(c.selection.vfd?.outputFilter ?? 'none')))] ?? 'none';

  const given = [...new Set(group.flatMap((c) => (c.load.driveInputAmps !== undefined ? [c.load.driveInputAmps] : [])))];
  if (given.length > 1)
    errors.push(`${tag}: its motors give different drive input currents (${given.join(', ')} A): give the drive's one rated input current`);
  const ratedInputAmps = given.length > 0 ? Math.max(...given) : null;
  const amps = round2(Math.max(ratedInputAmps ?? 0, sumFlcAmps));
  const byInput = ratedInputAmps !== null && ratedInputAmps >= sumFlcAmps;

  // 430.130(A)(1): Table 430.52 on the drive's input current; the lowest limit among its motors' kinds
  const type = first.load.scpdType;
  const protections = group.map((c) => branchProtection({ flcAmps: amps, type, motor: motorKind(c.load) }, edition));
  const p = protections.reduce((lo, x) => (x.ratingAmps < lo.ratingAmps ? x : lo));
  const protection = {
    type,
    maxPercent: p.maxPercent,
    computedMaxAmps: p.computedMaxAmps,
    ratingAmps: p.ratingAmps,
    basis: `${nec(edition, '430.130(A)(1)')}: ${p.maxPercent} % of ${amps} A (${byInput ? "the drive's rated input current" : "the motors' table FLCs, until the drive's rated input current is known"}); ${p.basis}; not above the maximum in the drive's instructions (430.130(A)(2); text from memory)`,
  };
  if (group.some((c) => c.load.scpdType !== type))
    errors.push(
      `${tag}: its motors name different protective devices; the drive's one input device is taken as ${type} (${first.selection.tag})`,
    );

  const listed = opts.terminationsListed75C !== false;
  const inputMin = round2(1.25 * amps);
  const inCond = selectConductor(
    inputMin,
    {
      material: first.load.conductor.material,
      tempRatingC: first.load.conductor.tempRatingC,
      ambientC: opts.ambientC,
      terminationsListed75C: listed,
      circuitAmps: protection.ratingAmps,
    },
    edition,
  );
  const largest = Math.max(...motors.map((m) => m.flcAmps));
  const outMin = round2(1.25 * largest + (sumFlcAmps - largest));
  const outCond = selectConductor(
    outMin,
    {
      material: first.load.conductor.material,
      tempRatingC: first.load.conductor.tempRatingC,
      ambientC: opts.ambientC,
      terminationsListed75C: listed,
    },
    edition,
  );
  return {
    tag,
    supply: first.load.supply === 'ac1' ? 'ac1' : 'ac3',
    volts: first.load.volts,
    motors,
    sumFlcAmps,
    sumFlaAmps,
    output: {
      duty,
      minOutputAmps: sumFlaAmps,
      outputFilter,
      basis: `drive ${duty}-duty output current >= the sum of its motors' nameplate FLA (common practice); ${nec(edition, '430.122, 430.124(A), 430.130')}`,
    },
    input: {
      ratedInputAmps,
      amps,
      conductor: {
        minAmpacity: inputMin,
        size: inCond.size,
        ampacity: inCond.ampacity,
        basis: `${nec(edition, '430.122(A)')}: 125 % of ${amps} A (${byInput ? "the drive's rated input current" : "the sum of the motors' table FLCs stands in for the drive's rated input current — common practice"}); ${inCond.basis}`,
      },
      protection,
    },
    outputConductor: {
      minAmpacity: outMin,
      size: outCond.size,
      ampacity: outCond.ampacity,
      basis: `${nec(edition, '430.24')} over the motors the output feeds: 125 % of ${largest} A + ${round2(sumFlcAmps - largest)} A (a reading; the engineer confirms); ${outCond.basis}`,
    },
    cautions: sharedDriveCautions(
      tag,
      motors.map((m) => m.tag),
    ),
  };
}

/** Groups the motors by the drive they name and sizes each drive that feeds two motors or more. */
export function sharedDrives(
  candidates: readonly SharedDriveCandidate[],
  opts: SharedDriveOptions,
  edition: CodeEdition,
): SharedDrivesResult {
  const notes: string[] = [];
  const errors: string[] = [];
  const byDrive = new Map<string, SharedDriveCandidate[]>();
  for (const c of candidates) {
    const tag = c.load.sharedDrive;
    if (tag === undefined) continue;
    const s = c.selection;
    if (s.errors.length > 0 || s.flcAmps <= 0) {
      errors.push(`${s.tag}: left out of shared drive ${tag} (its selection has errors)`);
      continue;
    }
    if (s.starter.type !== 'VFD') {
      errors.push(`${s.tag}: names shared drive ${tag} but its starter is ${s.starter.type}, not a drive: left out of ${tag}`);
      continue;
    }
    if (!c.onBus) {
      errors.push(
        `${s.tag}: names shared drive ${tag} but is not fed from the panel's bus: a shared drive behind another source is not worked out`,
      );
      continue;
    }
    byDrive.set(tag, [...(byDrive.get(tag) ?? []), c]);
  }
  const drives: SharedDrive[] = [];
  const memberTags = new Set<string>();
  for (const [tag, group] of byDrive) {
    if (group.length < 2) {
      notes.push(`${tag}: only ${group[0]?.selection.tag} names it: sized as that motor's own drive`);
      continue;
    }
    // one voltage: the same table column (a 460 V and a 480 V motor are both on a 480 V system)
    const kinds = new Set(group.map((c) => `${c.load.supply} ${c.selection.tableVolts ?? c.load.volts} V`));
    if (kinds.size > 1) {
      errors.push(
        `${tag}: its motors are at different voltages or phases (${group.map((c) => `${c.selection.tag} ${c.load.supply === 'ac1' ? 'single-phase' : 'three-phase'} ${c.load.volts} V`).join(', ')}): one drive feeds motors of one voltage and phase count; each is sized as its own drive until that is fixed`,
      );
      continue;
    }
    try {
      drives.push(driveOf(tag, group, opts, edition, errors));
      for (const c of group) memberTags.add(c.selection.tag);
    } catch (e) {
      errors.push(`${tag}: ${(e as Error).message}; each motor is sized as its own drive until that is fixed`);
    }
  }
  return { drives, memberTags, notes, errors };
}
