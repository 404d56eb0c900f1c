// The motor-list columns, derived from the motor's answers schema (LoadFieldsSchema): one column per answer,
// one per inner field of a nested answer (conductor.material -> conductorMaterial). A new answer in
// shared/schemas/load.ts gets its column, so the template, the import and the export carry it, without a list
// kept in step by hand; COLUMN_TEXT below only gives the words (header, note, example) and the order.
import { z } from 'zod';
import { LoadFieldsSchema } from '../../../shared/schemas/load';

export interface Column {
  header: string;
  key: string;
  kind: 'string' | 'number' | 'boolean' | 'integer';
  note: string;
  example: string | number | boolean;
  /** where the value sits in the answers when it is not `key` at the top (e.g. conductor.material) */
  path?: readonly [string, string];
}

interface ColumnText {
  /** the column header when it is not the answer's name (nested answers: one word) */
  header?: string;
  note: string;
  example: string | number | boolean;
}

/**
 * Words of the columns that have them, by answer path, in the order the template and the export show them.
 * An answer without an entry still gets its column, after these: its name as header (a nested one joined in
 * camel case), its options as the note.
 */
const COLUMN_TEXT: Record<string, ColumnText> = {
  tag: { note: 'unique on the panel', example: 'P-201' },
  description: { note: '', example: 'Backwash pump' },
  supply: { note: 'ac3, ac1 or dc', example: 'ac3' },
  hp: { note: 'or kw', example: 20 },
  kw: { note: 'or hp', example: '' },
  volts: { note: 'rated voltage', example: 460 },
  hz: { note: '60 by default', example: 60 },
  fla: { note: 'nameplate amperes', example: 25 },
  serviceFactor: { note: '1.0 by default', example: 1.15 },
  codeLetter: { note: 'NEMA code letter', example: 'G' },
  design: { note: 'A, B, C or D', example: 'B' },
  leads: { note: '3, 6, 9 or 12', example: '' },
  connection: { note: 'wye or delta', example: '' },
  singlePhaseType: { note: 'split-phase, capacitor-start, psc, two-value-capacitor', example: '' },
  dcField: { note: 'shunt, series, compound', example: '' },
  duty: { note: 'continuous or intermittent', example: 'continuous' },
  reversing: { note: 'yes/no', example: 'no' },
  jogging: { note: 'yes/no', example: 'no' },
  speedControl: { note: 'fixed or variable', example: 'fixed' },
  turndown: { note: 'e.g. 10 for 10:1', example: '' },
  torque: { note: 'variable or constant', example: '' },
  startingLimit: { note: 'none or reduced-inrush', example: 'none' },
  inertia: { note: 'normal, high, very-high', example: 'normal' },
  reverseRotationHazard: { note: 'yes/no', example: 'no' },
  critical: { note: 'yes/no', example: 'no' },
  environment: { note: 'indoor-dry, indoor-dusty, outdoor, washdown, corrosive, class1-div1 …', example: 'indoor-dusty' },
  scpdType: {
    note: 'inverse-time-breaker, instantaneous-trip-breaker, dual-element-fuse, non-time-delay-fuse',
    example: 'inverse-time-breaker',
  },
  cableLengthFt: { note: 'feet', example: 80 },
  tempRiseC: { note: 'marked temperature rise, °C (40 or less allows 125 % overload, 430.32)', example: '' },
  lockedRotorWithstandS: {
    note: "locked-rotor withstand (hot safe stall) time, s, from the motor maker's data: limits the trip class",
    example: '',
  },
  energyEfficient: { note: 'yes/no; Design B energy-efficient (Table 430.52 instantaneous-trip 1100 %)', example: 'no' },
  poles: { note: 'even number (synchronous speed)', example: 4 },
  rotor: { note: 'squirrel-cage or wound-rotor', example: 'squirrel-cage' },
  plugging: { note: 'yes/no', example: 'no' },
  twoSpeed: { note: 'yes/no; two-speed motor', example: 'no' },
  starterPreference: { note: 'rvss, wye-delta or part-winding (when inrush must be limited)', example: '' },
  insideDelta: { note: 'yes/no; soft starter inside the delta', example: 'no' },
  quickStop: { note: 'yes/no; DC quick stops (dynamic braking)', example: 'no' },
  driveInputAmps: { note: "the chosen drive's rated input current, A (430.122(A))", example: '' },
  sharedDrive: { note: 'tag of a drive shared with other variable-speed motors at the same voltage, e.g. VFD-1', example: '' },
  branchGroup: { note: 'tag of the group of motors on one branch circuit (430.53), e.g. G-1; empty: own branch circuit', example: '' },
  groupListedMaxAmps: {
    note: 'largest fuse or inverse-time breaker, A, marked on the controller and overload relay listed for group installation (430.53(C)); empty: not listed',
    example: '',
  },
  'conductor.material': { header: 'conductorMaterial', note: 'cu or al (cu by default)', example: 'cu' },
  'conductor.tempRatingC': { header: 'conductorTempC', note: 'insulation rating 60, 75 or 90 (75 by default)', example: 75 },
  'scpdOverride.maxPercent': {
    header: 'scpdOverridePercent',
    note: '430.52(C)(1) Exception No. 2 limit, % (only with a reason)',
    example: '',
  },
  'scpdOverride.reason': { header: 'scpdOverrideReason', note: 'why the motor will not start at the normal limit', example: '' },
};

type Leaf = z.ZodType;

/** The schema under optional, default and nullable wrappers. */
function bare(s: Leaf): Leaf {
  let t = s;
  while (t instanceof z.ZodOptional || t instanceof z.ZodDefault || t instanceof z.ZodPrefault || t instanceof z.ZodNullable)
    t = t.unwrap() as Leaf;
  return t;
}

function kindOf(s: Leaf): Column['kind'] {
  const t = bare(s);
  if (t instanceof z.ZodBoolean) return 'boolean';
  if (t instanceof z.ZodNumber) return t.format === 'safeint' || t.format === 'int32' ? 'integer' : 'number';
  if (t instanceof z.ZodUnion && t.options.every((o) => o instanceof z.ZodLiteral && [...o.values].every((v) => Number.isInteger(v))))
    return 'integer';
  return 'string';
}

/** The options of an enum or a union of literals, in words ("a, b or c"); '' for a free value. */
function optionsOf(s: Leaf): string {
  const t = bare(s);
  const values =
    t instanceof z.ZodEnum
      ? t.options
      : t instanceof z.ZodUnion
        ? t.options.flatMap((o) => (o instanceof z.ZodLiteral ? [...o.values] : []))
        : [];
  if (values.length === 0) return kindOf(s) === 'boolean' ? 'yes/no' : '';
  const words = values.map(String);
  return words.length === 1 ? words[0]! : `${words.slice(0, -1).join(', ')} or ${words.at(-1)}`;
}

function camel(path: readonly [string, string]): string {
  return path[0] + path[1].charAt(0).toUpperCase() + path[1].slice(1);
}

/** Every answer of the schema as [answer path, its schema, its place in the answers]. */
function answers(schema: z.ZodObject): Array<{ id: string; schema: Leaf; path?: readonly [string, string] }> {
  return Object.entries(schema.shape).flatMap(([key, schema]) => {
    const t = bare(schema as Leaf);
    if (t instanceof z.ZodObject) {
      return Object.entries(t.shape).map(([inner, s]) => ({ id: `${key}.${inner}`, schema: s as Leaf, path: [key, inner] as const }));
    }
    return [{ id: key, schema: schema as Leaf }];
  });
}

/** The columns of an answers schema (exported for its test; the product uses IMPORT_COLUMNS). */
export function columnsOf(schema: z.ZodObject): Column[] {
  const order = Object.keys(COLUMN_TEXT);
  const place = (id: string) => {
    const i = order.indexOf(id);
    return i === -1 ? order.length : i;
  };
  return answers(schema)
    .map((a, i) => ({ a, i }))
    .sort((x, y) => place(x.a.id) - place(y.a.id) || x.i - y.i)
    .map(({ a }) => {
      const text = COLUMN_TEXT[a.id];
      const header = text?.header ?? (a.path ? camel(a.path) : a.id);
      return {
        header,
        key: header,
        kind: kindOf(a.schema),
        note: text?.note ?? optionsOf(a.schema),
        example: text?.example ?? '',
        ...(a.path ? { path: a.path } : {}),
      };
    });
}

/** The motor-list import and export columns (one per answer of LoadFieldsSchema). */
export const IMPORT_COLUMNS: Column[] = columnsOf(LoadFieldsSchema);

/** Column words left over from an answer the schema no longer has (the unit test keeps this empty). */
export const STALE_COLUMN_TEXT: string[] = Object.keys(COLUMN_TEXT).filter((id) => !answers(LoadFieldsSchema).some((a) => a.id === id));
