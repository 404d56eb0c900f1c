// Full-load current per NEC 430.6(A)(1): the table current (Tables 430.247, 430.248, 430.250)
// sizes conductors, short-circuit protection, disconnects and feeders. kW ratings are converted
// to horsepower; a rating between two rows takes the next higher row (never interpolated); outside
// the tables the nameplate current is used when given, else it is an error.

import { OutsideTableError } from '../errors';
import type { AssumedInput } from '../schemas/selection';
import { nec, type CodeEdition } from '../standards/code-edition';
import { formatHp, sameHp } from '../standards/hp-rows';
import { TABLE_430_247, column430247, dcFlc, hpRows430247 } from '../standards/nec-table-430-247';
import { TABLE_430_248, column430248, hpRows430248, singlePhaseFlc } from '../standards/nec-table-430-248';
import { TABLE_430_250, column430250, hpRows430250, threePhaseFlc } from '../standards/nec-table-430-250';
import { round2 } from './round';

export const WATTS_PER_HP = 745.7;
/** common practice: a kW rating within 2 % of a horsepower row is treated as that row */
export const KW_ROW_TOLERANCE = 0.02;

export interface FlcInput {
  supply: 'ac3' | 'ac1' | 'dc';
  hp?: number;
  kw?: number;
  volts: number;
  fla?: number;
}

export interface FlcResult {
  flcAmps: number;
  /** table column voltage, or null where the nameplate current was used */
  tableVolts: number | null;
  /** horsepower used (converted from kW where needed) */
  hp: number;
  source: string;
  basis: string;
  assumed: AssumedInput[];
  cautions: string[];
}

interface TableView {
  name: string;
  column: number;
  rows: number[];
  value: (hp: number) => number;
}

function tableView(supply: FlcInput['supply'], volts: number): TableView {
  if (supply === 'ac3') {
    const c = column430250(volts);
    return { name: TABLE_430_250, column: c, rows: hpRows430250(c), value: (hp) => threePhaseFlc(hp, c) };
  }
  if (supply === 'ac1') {
    const c = column430248(volts);
    return { name: TABLE_430_248, column: c, rows: hpRows430248(), value: (hp) => singlePhaseFlc(hp, c) };
  }
  const c = column430247(volts);
  return { name: TABLE_430_247, column: c, rows: hpRows430247(c), value: (hp) => dcFlc(hp, c) };
}

export function fullLoadCurrent(input: FlcInput, edition: CodeEdition): FlcResult {
  const assumed: AssumedInput[] = [];
  const cautions: string[] = [];
  let hp: number;
  if (input.hp !== undefined) hp = input.hp;
  else if (input.kw !== undefined) hp = (input.kw * 1000) / WATTS_PER_HP;
  else throw new OutsideTableError('430.6(A)(1)', 'hp or kw is required');

  const fromNameplate = (why: string): FlcResult => {
    cautions.push(
      `${why}; the nameplate current ${input.fla} A is used for conductors and protection in place of a table value — confirm with the engineer.`,
    );
    return {
      flcAmps: input.fla as number,
      tableVolts: null,
      hp: round2(hp),
      source: `nameplate FLA (${why})`,
      basis: `${nec(edition, '430.6(A)(1)')}, nameplate current`,
      assumed,
      cautions,
    };
  };

  let view: TableView;
  try {
    view = tableView(input.supply, input.volts);
  } catch (e) {
    if (e instanceof OutsideTableError && input.fla !== undefined) return fromNameplate(e.message);
    throw e;
  }

  const basis = nec(edition, `430.6(A)(1), ${view.name}`);
  const source = `${view.name} (${view.column} V column)`;

  if (input.kw !== undefined) {
    const near = view.rows.find((r) => Math.abs(hp - r) / r <= KW_ROW_TOLERANCE);
    if (near !== undefined) {
      assumed.push({
        field: 'kw',
        assumed: `${formatHp(near)} hp row`,
        note: `${input.kw} kW = ${round2(hp)} hp, within 2 % of the ${formatHp(near)} hp row (common practice)`,
      });
      return { flcAmps: view.value(near), tableVolts: view.column, hp: round2(hp), source, basis, assumed, cautions };
    }
  } else {
    const row = view.rows.find((r) => sameHp(r, hp));
    if (row !== undefined) return { flcAmps: view.value(row), tableVolts: view.column, hp, source, basis, assumed, cautions };
  }

  // No interpolation for a horsepower between two rows: 430.6(A)(1) gives none, and interpolating
  // would undersize the conductor, the protective device and the feeder. The next higher row governs.
  const upper = view.rows.find((r) => r > hp);
  if (upper === undefined || hp < (view.rows[0] as number)) {
    const why = `${view.name}: ${formatHp(round2(hp))} hp is outside the table at ${view.column} V`;
    if (input.fla !== undefined) return fromNameplate(why);
    throw new OutsideTableError(view.name, `${formatHp(round2(hp))} hp is outside the table at ${view.column} V; give the nameplate FLA`);
  }
  const flc = view.value(upper);
  assumed.push({
    field: input.kw !== undefined ? 'kw' : 'hp',
    assumed: `${formatHp(upper)} hp row (${flc} A), the next higher row`,
    note: `${formatHp(round2(hp))} hp is not a row of ${view.name}: the next higher horsepower row is taken, not interpolated (430.6(A)(1) gives no interpolation for horsepower; interpolating would undersize conductors and protection); a nameplate FLA above it still governs the overload (430.6(A)(2))`,
  });
  return {
    flcAmps: flc,
    tableVolts: view.column,
    hp: round2(hp),
    source: `${source}, next higher row ${formatHp(upper)} hp for ${formatHp(round2(hp))} hp`,
    basis,
    assumed,
    cautions,
  };
}

/** Why a motor cannot be sized: the answer to correct (its path) and the reason in words. */
export interface FlcRefusal {
  path: 'volts' | 'hp' | 'kw';
  message: string;
}

/**
 * A motor the engine cannot size is refused, not answered with zeros: no FLC table covers its rated
 * voltage, or its rating lies outside the table, and no nameplate FLA was given (430.6(A)(1)).
 * With a nameplate FLA the nameplate current is used instead (and cautioned), so nothing is refused.
 */
export function flcRefusal(input: FlcInput): FlcRefusal | null {
  if (input.fla !== undefined || (input.hp === undefined && input.kw === undefined)) return null;
  try {
    tableView(input.supply, input.volts);
  } catch (e) {
    if (!(e instanceof OutsideTableError)) throw e;
    return {
      path: 'volts',
      message: `rated ${input.volts} V: no full-load current table covers it (${e.message}); give the nameplate FLA to size this motor on its nameplate current`,
    };
  }
  try {
    fullLoadCurrent(input, '2023');
  } catch (e) {
    if (!(e instanceof OutsideTableError)) throw e;
    return { path: input.kw !== undefined ? 'kw' : 'hp', message: `${e.message} (NEC 430.6(A)(1))` };
  }
  return null;
}
