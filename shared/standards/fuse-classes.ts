// The order in which the bill of materials tries fuse classes where a fuse is called for. A shop
// preference (common practice), not a code requirement: every class listed is a current-limiting class
// with a rejection feature (UL 248).

/** A branch circuit's fuses: class J first (compact, current-limiting), then RK5, then CC (common practice). */
export const BRANCH_FUSE_CLASS_ORDER = ['J', 'RK5', 'CC'] as const;

export type BranchFuseClass = (typeof BRANCH_FUSE_CLASS_ORDER)[number];

/** A control transformer's primary and secondary fuses: class CC first (up to 30 A), then J (common practice). */
export const CONTROL_TRANSFORMER_FUSE_CLASS_ORDER = ['CC', 'J'] as const;

/** A fused panel main: class J time-delay fuses in a main disconnect (common practice). */
export const MAIN_FUSE_CLASS = 'J' as const;
