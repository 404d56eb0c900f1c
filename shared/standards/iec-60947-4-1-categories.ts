// IEC 60947-4-1 utilisation categories for motor contactors: AC-3 (squirrel-cage motors: starting,
// switching off while running) and AC-4 (starting, plugging, inching/jogging). The standard defines
// the categories, not frame sizes: the contactor's rated operational current Ie in the category
// must be at least the motor's current. Category choice follows the rule files.

export type IecCategory = 'AC-3' | 'AC-4';

export const IEC_60947_4_1 = 'IEC 60947-4-1';

/** Minimum rated operational current in the category: the larger of nameplate and table current. */
export function iecMinOperationalCurrent(flcAmps: number, flaAmps: number): number {
  return Math.max(flcAmps, flaAmps);
}
