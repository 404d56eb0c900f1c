// Several motors on one branch circuit (NEC 430.53): the group's result as the roll-up, the bill of
// materials, the checks and the submittal read it (computed by shared/calc/group-circuits.ts).

/** The three paths of 430.53 by which motors may share a branch circuit. */
export type GroupPath = 'A' | 'B' | 'C';

export interface GroupPathResult {
  path: GroupPath;
  /** "430.53(A)" … with the edition */
  clause: string;
  /** the path's conditions in words (a paraphrase of the clause) */
  conditions: string;
  allowed: boolean;
  /** the largest device rating the path permits, A (null when a condition fails before it is known) */
  maxAmps: number | null;
  /** the standard rating the path gives the group, A */
  ratingAmps: number | null;
  /** why the path does not allow the group (empty when allowed) */
  reasons: string[];
}

/** One motor's tap from the group conductor to its overload relay (430.53(D)). */
export interface GroupTap {
  tag: string;
  flcAmps: number;
  /** 430.53(D)(1) ampacity of the group conductor, (D)(2) one-third of it (taps not over 25 ft) */
  rule: 'D(1)' | 'D(2)';
  minAmpacity: number;
  size: string;
  ampacity: number;
  /** the motor's own 430.22 conductor when the tap rule asks for a larger one */
  ownSize: string;
  basis: string;
}

/** Each motor's own overload protection, which every path asks for (430.32). */
export interface GroupOverload {
  tag: string;
  maxSettingAmps: number;
  basis: string;
}

export interface GroupCircuit {
  /** the group's tag, as the motors' answers give it */
  group: string;
  motors: string[];
  volts: number;
  /** the path that allows the group (the first of A, B, C in that order); null: refused */
  path: GroupPath | null;
  paths: GroupPathResult[];
  /** the group's branch short-circuit and ground-fault protective device; null when refused */
  device: null | {
    type: 'inverse-time-breaker' | 'dual-element-fuse' | 'non-time-delay-fuse';
    ratingAmps: number;
    basis: string;
  };
  /** the group's branch conductor to the taps (430.24); null when it cannot be sized */
  conductor: null | { minAmpacity: number; size: string; ampacity: number; basis: string };
  taps: GroupTap[];
  overloads: GroupOverload[];
  /** why no path allows the group, in words; null when a path allows it */
  refusal: string | null;
  /** what the engineer verifies that the answers cannot show */
  verify: string[];
  basis: string;
}
