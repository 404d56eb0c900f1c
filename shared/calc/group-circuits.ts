// Several motors on one branch circuit, NEC 430.53 (clause text paraphrased from memory of the
// published edition; check against it):
//   430.53: two or more motors may share a branch circuit under (D) and one of (A), (B) or (C); the
//     branch-circuit protective device shall be fuses or inverse-time circuit breakers.
//   (A) Not over 1 hp: each motor not over 1 hp, on a nominal 120 V circuit protected at not over 20 A
//     or a circuit of 1000 V nominal or less (600 V in NEC 2020) protected at not over 15 A, where
//     (1) each motor's full-load rating is not over 6 A, (2) the device rating marked on any of the
//     controllers is not exceeded, (3) each motor has overload protection per 430.32.
//   (B) If smallest motor protected: the device not over the value 430.52 allows for the motor of the
//     smallest rating, each motor with its own overload protection, where it can be determined that
//     the device will not open under the most severe normal conditions of service.
//   (C) Other group installations: each motor with its own overload protection; each overload device
//     and each controller either listed for group installation with a specified maximum fuse or
//     inverse-time breaker, or selected so that the device does not exceed what 430.52 permits for
//     that motor; breakers listed and inverse-time; (4) the device not over the 430.52 rating for
//     the highest rated motor plus the sum of the other motors' full-load currents.
//   (D) Single motor taps: no individual device for a tap to one motor where (1) the tap's ampacity
//     is not less than the branch conductor's, or (2) not less than one-third of it (and 430.22),
//     not over 25 ft to the overload device and protected from physical damage.
// Highest and smallest rated motor by the table full-load current (430.17). The group's branch
// conductor per 430.24 (125 % of the largest FLC plus the others).
import type { GroupCircuit, GroupOverload, GroupPath, GroupPathResult, GroupTap } from '../schemas/group-circuit';
import type { LoadSelection } from '../schemas/selection';
import { nec, type CodeEdition } from '../standards/code-edition';
import { nextLowerStandard, type DeviceFamily } from '../standards/nec-table-240-6a';
import { selectConductor } from './conductor';
import { round2 } from './round';

export interface GroupMember {
  tag: string;
  /** the group tag the motor's answers give */
  branchGroup: string;
  /** largest fuse or inverse-time breaker marked on its controller and overload relay listed for group installation; null: not listed */
  listedMaxAmps: number | null;
  selection: LoadSelection;
}

export interface GroupOptions {
  ambientC: number;
  terminationsListed75C?: boolean;
}

type GroupDeviceType = NonNullable<GroupCircuit['device']>['type'];
const DRIVES = new Set(['VFD', 'dc-drive']);
const EPS = 1e-9;

/** The members grouped by their tag, in the order the tags first appear. */
export function membersByGroup(members: readonly GroupMember[]): Map<string, GroupMember[]> {
  const out = new Map<string, GroupMember[]>();
  for (const m of members) out.set(m.branchGroup, [...(out.get(m.branchGroup) ?? []), m]);
  return out;
}

/** What keeps the motors off one branch circuit whatever the path: returned as the refusal. */
function groupBlockers(ms: readonly GroupMember[], edition: CodeEdition): string[] {
  const out: string[] = [];
  if (ms.length < 2)
    out.push(`a group is two or more motors on one branch circuit (${nec(edition, '430.53')}); give another motor this group`);
  const errs = ms.filter((m) => m.selection.errors.length > 0 || m.selection.flcAmps <= 0);
  if (errs.length) out.push(`${errs.map((m) => m.tag).join(', ')}: the selection has errors`);
  const circuits = new Set(ms.map((m) => `${m.selection.supply} ${m.selection.volts}`));
  if (circuits.size > 1) out.push('the motors of one branch circuit share its supply and voltage');
  const drives = ms.filter((m) => DRIVES.has(m.selection.starter.type));
  if (drives.length)
    out.push(`${drives.map((m) => m.tag).join(', ')}: a drive's input protection follows its listing (430.130), not a group here`);
  const types = new Set(ms.map((m) => m.selection.scpd.type));
  if (types.has('instantaneous-trip-breaker'))
    out.push(`the device of a group is fuses or an inverse-time breaker (${nec(edition, '430.53')}), not an instantaneous-trip breaker`);
  else if (types.size > 1) out.push('the motors ask for different protective device types: choose one for the group');
  return out;
}

function pathResult(
  path: GroupPath,
  edition: CodeEdition,
  conditions: string,
  reasons: string[],
  maxAmps: number | null,
  family: DeviceFamily,
  runningAmps: number,
): GroupPathResult {
  let ratingAmps: number | null = null;
  if (maxAmps !== null) {
    try {
      ratingAmps = nextLowerStandard(maxAmps, edition, family);
    } catch {
      reasons.push(`${maxAmps} A is below the smallest standard rating of Table 240.6(A)`);
    }
  }
  // a device rated below the motors' running current opens in normal service (common practice reading of "will not open")
  if (ratingAmps !== null && ratingAmps + EPS < runningAmps)
    reasons.push(`${ratingAmps} A is below the ${runningAmps} A the motors draw running together (common practice)`);
  return { path, clause: nec(edition, `430.53(${path})`), conditions, allowed: reasons.length === 0, maxAmps, ratingAmps, reasons };
}

function pathA(ms: readonly GroupMember[], volts: number, edition: CodeEdition, family: DeviceFamily, running: number): GroupPathResult {
  const reasons: string[] = [];
  const upTo = edition === '2023' ? 1000 : 600;
  const big = ms.filter((m) => m.selection.hp === null || m.selection.hp > 1 + EPS);
  if (big.length) reasons.push(`${big.map((m) => m.tag).join(', ')}: over 1 hp (or no horsepower given)`);
  const over6 = ms.filter((m) => m.selection.flcAmps > 6 + EPS);
  if (over6.length) reasons.push(`${over6.map((m) => `${m.tag} ${m.selection.flcAmps} A`).join(', ')}: full-load current over 6 A`);
  // a nominal 120 V AC circuit (motors rated 110–120 V): 20 A; any other circuit up to 1000 V (600 V in 2020): 15 A
  const ac = ms.every((m) => m.selection.supply !== 'dc');
  let limit: number | null = ac && volts >= 110 && volts <= 120 ? 20 : volts <= upTo ? 15 : null;
  if (limit === null) reasons.push(`${volts} V is above ${upTo} V`);
  const marked = ms.flatMap((m) => (m.listedMaxAmps !== null ? [m.listedMaxAmps] : []));
  if (limit !== null && marked.length) limit = Math.min(limit, ...marked);
  const conditions = `each motor not over 1 hp and not over 6 A full-load current; the device not over 20 A on a nominal 120 V circuit, 15 A up to ${upTo} V, nor over the rating marked on any controller; each motor's overload per 430.32`;
  return pathResult('A', edition, conditions, reasons, reasons.length ? null : limit, family, running);
}

function pathB(ms: readonly GroupMember[], edition: CodeEdition, family: DeviceFamily, running: number): GroupPathResult {
  const smallest = ms.reduce((a, m) => (m.selection.flcAmps < a.selection.flcAmps ? m : a));
  const conditions = `the device not over the value 430.52 allows for the smallest motor (${smallest.tag}, ${smallest.selection.scpd.ratingAmps} A), each motor with its own overload, and the device does not open in the most severe normal service`;
  return pathResult('B', edition, conditions, [], smallest.selection.scpd.ratingAmps, family, running);
}

function pathC(ms: readonly GroupMember[], edition: CodeEdition, family: DeviceFamily, running: number): GroupPathResult {
  const largest = ms.reduce((a, m) => (m.selection.flcAmps > a.selection.flcAmps ? m : a));
  const c4 = round2(largest.selection.scpd.ratingAmps + running - largest.selection.flcAmps);
  // (C)(1), (2): each motor's listing for group installation, or else its own 430.52 value
  const limits = ms.map((m) => m.listedMaxAmps ?? m.selection.scpd.ratingAmps);
  const max = Math.min(c4, ...limits);
  const reasons: string[] = [];
  const unlisted = ms.filter((m) => m.listedMaxAmps === null && m.selection.scpd.ratingAmps + EPS < c4);
  if (unlisted.length && max + EPS < running)
    reasons.push(`${unlisted.map((m) => m.tag).join(', ')}: controller and overload relay not listed for group installation`);
  const conditions = `each controller and overload relay listed for group installation with a marked maximum fuse or inverse-time breaker (or the device within 430.52 for that motor); the device not over ${largest.selection.scpd.ratingAmps} A (430.52 for ${largest.tag}) + ${round2(running - largest.selection.flcAmps)} A of the other FLCs = ${c4} A`;
  return pathResult('C', edition, conditions, reasons, max, family, running);
}

function groupConductor(ms: readonly GroupMember[], deviceAmps: number | null, opts: GroupOptions, edition: CodeEdition) {
  const largest = ms.reduce((a, m) => (m.selection.flcAmps > a.selection.flcAmps ? m : a));
  const total = ms.reduce((s, m) => s + m.selection.flcAmps, 0);
  const minAmpacity = round2(1.25 * largest.selection.flcAmps + total - largest.selection.flcAmps);
  const { material, tempRatingC } = largest.selection.conductor;
  const c = selectConductor(
    minAmpacity,
    {
      material,
      tempRatingC,
      ambientC: opts.ambientC,
      terminationsListed75C: opts.terminationsListed75C,
      circuitAmps: deviceAmps ?? minAmpacity,
    },
    edition,
  );
  return {
    minAmpacity,
    size: c.size,
    ampacity: c.ampacity,
    basis: `${nec(edition, '430.24 (125 % of the largest FLC plus the others)')}; ${c.basis}`,
  };
}

function groupTaps(ms: readonly GroupMember[], groupAmpacity: number, opts: GroupOptions, edition: CodeEdition): GroupTap[] {
  return ms.map((m) => {
    const own = m.selection.conductor;
    const base = { tag: m.tag, flcAmps: m.selection.flcAmps, ownSize: own.size };
    if (own.ampacity + EPS >= groupAmpacity)
      return {
        ...base,
        rule: 'D(1)',
        minAmpacity: round2(groupAmpacity),
        size: own.size,
        ampacity: own.ampacity,
        basis: nec(edition, '430.53(D)(1)'),
      };
    const minAmpacity = round2(Math.max(own.minAmpacity, groupAmpacity / 3));
    const c = selectConductor(minAmpacity, { ...own, ambientC: opts.ambientC, terminationsListed75C: opts.terminationsListed75C }, edition);
    return {
      ...base,
      rule: 'D(2)',
      minAmpacity,
      size: c.size,
      ampacity: c.ampacity,
      basis: `${nec(edition, '430.53(D)(2) (one-third of the group conductor, and 430.22; not over 25 ft to the overload relay, protected from damage)')}; ${c.basis}`,
    };
  });
}

const VERIFY = {
  A: '430.53(A)(2): the device does not exceed the rating marked on any of the controllers (check the markings).',
  B: '430.53(B): the engineer determines that the device will not open when the motors start in the most severe normal service.',
  C: '430.53(C): the controllers and overload relays are a listed factory assembly with the device provided or marked, or separate assemblies listed for such use with instructions for use together.',
  taps: '430.53(D)(2): taps not over 25 ft from the group conductor to each overload relay, inside the enclosure or a raceway (taken so for taps inside the panel).',
};

/** One group's paths, device, conductor, taps and overloads, or its refusal. */
export function groupCircuit(group: string, ms: readonly GroupMember[], opts: GroupOptions, edition: CodeEdition): GroupCircuit {
  const overloads: GroupOverload[] = ms.map((m) => ({
    tag: m.tag,
    maxSettingAmps: m.selection.overload.maxSettingAmps,
    basis: m.selection.overload.basis,
  }));
  const empty = {
    group,
    motors: ms.map((m) => m.tag),
    volts: ms[0]?.selection.volts ?? 0,
    overloads,
    basis: nec(edition, '430.53, 430.17, 430.24, Table 430.52, Table 240.6(A)'),
  };
  const blockers = groupBlockers(ms, edition);
  if (blockers.length)
    return { ...empty, path: null, paths: [], device: null, conductor: null, taps: [], refusal: blockers.join('; '), verify: [] };
  const type = (ms[0] as GroupMember).selection.scpd.type as GroupDeviceType;
  const family: DeviceFamily = type === 'inverse-time-breaker' ? 'breaker' : 'fuse';
  const running = round2(ms.reduce((s, m) => s + m.selection.flcAmps, 0));
  const paths = [
    pathA(ms, empty.volts, edition, family, running),
    pathB(ms, edition, family, running),
    pathC(ms, edition, family, running),
  ];
  const chosen = paths.find((p) => p.allowed) ?? null;
  const rating = chosen?.ratingAmps ?? null;
  const conductor = groupConductor(ms, rating, opts, edition);
  if (!chosen || rating === null)
    return {
      ...empty,
      path: null,
      paths,
      device: null,
      conductor,
      taps: [],
      refusal: `no path of 430.53 allows these motors on one branch circuit: ${paths.map((p) => `(${p.path}) ${p.reasons.join('; ')}`).join(' — ')}`,
      verify: [],
    };
  return {
    ...empty,
    path: chosen.path,
    paths,
    device: { type, ratingAmps: rating, basis: `${chosen.clause}, 430.17, Table 430.52, Table 240.6(A)` },
    conductor,
    taps: groupTaps(ms, conductor.ampacity, opts, edition),
    refusal: null,
    verify: [VERIFY[chosen.path], VERIFY.taps],
  };
}

/** The allowed group whose device serves the motor (430.53); null: the motor is on its own branch circuit. */
export function motorGroup(rollup: { groups?: GroupCircuit[] } | null | undefined, tag: string): GroupCircuit | null {
  return (rollup?.groups ?? []).find((g) => g.device !== null && g.motors.includes(tag)) ?? null;
}

/** Every group of the panel's motors (those whose answers name a branch-circuit group). */
export function groupCircuits(members: readonly GroupMember[], opts: GroupOptions, edition: CodeEdition): GroupCircuit[] {
  return [...membersByGroup(members)].map(([g, ms]) => groupCircuit(g, ms, opts, edition));
}
