// What goes on the backplate, in the order it is laid out: the bill of materials' mounted parts as units of
// one place on a row (a part, or a contactor with the overload relay it carries under it), each with its
// catalogue outline and clearances, and the parts that cannot be laid out with the reason. Pure TypeScript.
import { PANEL_BUCKET, type BomLine, type CatalogueItem, type Category } from '../../schemas/catalogue';

/** Parts mounted on the backplate; the rest go elsewhere (see NOT_ON_PLATE). */
const ON_PLATE: ReadonlySet<Category> = new Set<Category>([
  'contactor',
  'overload-relay',
  'inverse-time-breaker',
  'motor-circuit-protector',
  'fuse-holder',
  'fused-disconnect',
  'disconnect-switch',
  'manual-motor-protector',
  'soft-starter',
  'vfd',
  'phase-monitor-relay',
  'control-transformer',
  'terminal-block',
  'main-breaker',
  'main-disconnect',
  'power-distribution-block',
  'output-filter',
  'braking-resistor',
  'dc-drive',
  'dc-starter',
  'field-loss-relay',
  'power-transformer',
  'dc-power-supply',
]);

/**
 * Where the other categories go: fitted to another part (interlock kits and auxiliary contacts on their
 * contactor, fuses in their holder or switch), on the door (pilot devices, cooling), or not a mounted part.
 */
export const NOT_ON_PLATE: Readonly<Partial<Record<Category, string>>> = {
  'mechanical-interlock': 'fitted between the contactors they interlock',
  'aux-contact': 'fitted to their contactor',
  fuse: 'in their holder or switch',
  'pilot-device': 'on the door',
  cooling: 'on the door or a side wall',
  wire: 'in the duct',
  enclosure: 'around the backplate',
};

/** Tag prefix of a part on the layout, by category (the bucket number goes before it). */
const TAG_PREFIX: Readonly<Partial<Record<Category, string>>> = {
  contactor: 'M',
  'overload-relay': 'OL',
  'inverse-time-breaker': 'CB',
  'motor-circuit-protector': 'MCP',
  'fuse-holder': 'FU',
  'fused-disconnect': 'DS',
  'disconnect-switch': 'DS',
  'manual-motor-protector': 'MMP',
  'soft-starter': 'SST',
  vfd: 'VFD',
  'phase-monitor-relay': 'PMR',
  'control-transformer': 'CPT',
  'terminal-block': 'TB',
  'main-breaker': 'MAIN',
  'main-disconnect': 'MAIN',
  'power-distribution-block': 'PDB',
  'output-filter': 'FLT',
  'braking-resistor': 'DB',
  'dc-drive': 'DCD',
  'dc-starter': 'DCS',
  'field-loss-relay': 'FL',
  'power-transformer': 'XF',
  'dc-power-supply': 'DCPS',
};

/** One physical part of a unit. */
export interface LayoutPart {
  tag: string;
  code: string;
  category: Category;
  description: string;
  widthMm: number;
  heightMm: number;
  depthMm: number;
}

/** What takes one place on a row. */
export interface LayoutUnit {
  /** the tag of its first part */
  tag: string;
  /** the bill of materials' bucket (motor tag, or PANEL_BUCKET) */
  bucket: string;
  /** top to bottom: a contactor with its overload relay under it, else one part */
  parts: LayoutPart[];
  widthMm: number;
  heightMm: number;
  depthMm: number;
  clearanceAboveMm: number;
  clearanceBelowMm: number;
  /** terminal blocks: laid out on the terminal rows at the foot of the plate */
  terminal: boolean;
  /** the terminal strip it belongs to (the bucket's TB tag), for the spacing between strips */
  strip: string | null;
}

/** A part of the bill of materials the layout cannot place, and why. */
export interface UnplacedPart {
  tag: string;
  bucket: string;
  code: string | null;
  category: Category;
  description: string;
  reason: string;
}

export interface LayoutUnits {
  units: LayoutUnit[];
  unplaced: UnplacedPart[];
}

const MAIN_CATEGORIES: readonly Category[] = ['main-breaker', 'main-disconnect', 'power-distribution-block'];

function partOf(item: CatalogueItem, tag: string): LayoutPart | null {
  const { outlineWidthMm: w, outlineHeightMm: h, outlineDepthMm: d } = item;
  if (!(w && h && d)) return null;
  return { tag, code: item.code, category: item.category, description: item.description, widthMm: w, heightMm: h, depthMm: d };
}

function unitOf(bucket: string, item: CatalogueItem, parts: LayoutPart[], strip: string | null): LayoutUnit {
  return {
    tag: parts[0]!.tag,
    bucket,
    parts,
    widthMm: Math.max(...parts.map((p) => p.widthMm)),
    heightMm: parts.reduce((sum, p) => sum + p.heightMm, 0),
    depthMm: Math.max(...parts.map((p) => p.depthMm)),
    clearanceAboveMm: item.clearanceAboveMm ?? 0,
    clearanceBelowMm: item.clearanceBelowMm ?? 0,
    terminal: item.category === 'terminal-block',
    strip,
  };
}

/** The buckets in the order of the bill of materials (the panel's own items first, as the main comes first). */
function bucketOrder(lines: readonly BomLine[]): string[] {
  const order = [PANEL_BUCKET];
  for (const l of lines) if (!order.includes(l.bucket)) order.push(l.bucket);
  return order;
}

/** Lines of a bucket that go on the plate, the main and its distribution block first for the panel's own items. */
function plateLines(lines: readonly BomLine[], bucket: string): BomLine[] {
  const own = lines.filter((l) => l.bucket === bucket && ON_PLATE.has(l.category as Category) && l.quantity > 0);
  if (bucket !== PANEL_BUCKET) return own;
  const rank = (l: BomLine) => {
    const i = MAIN_CATEGORIES.indexOf(l.category as Category);
    return i < 0 ? MAIN_CATEGORIES.length : i;
  };
  return own
    .map((l, i) => ({ l, i }))
    .sort((a, b) => rank(a.l) - rank(b.l) || a.i - b.i)
    .map((x) => x.l);
}

/**
 * The units of the layout in order: the main and distribution block, then bucket by bucket in the bill of
 * materials' order (the panel's other items, such as the control power transformer, after the main), and
 * last every bucket's terminal strip. Tags: the bucket's number on the panel (none for the panel's own
 * items), the category's prefix, and a running number where a bucket has more than one.
 */
export function layoutUnits(lines: readonly BomLine[], itemOf: (code: string) => CatalogueItem | undefined): LayoutUnits {
  const units: LayoutUnit[] = [];
  const terminals: LayoutUnit[] = [];
  const unplaced: UnplacedPart[] = [];
  const order = bucketOrder(lines);
  let bucketNumber = 0;
  for (const bucket of order) {
    const own = plateLines(lines, bucket);
    if (bucket !== PANEL_BUCKET && lines.some((l) => l.bucket === bucket)) bucketNumber++;
    if (own.length === 0) continue;
    const prefix = bucket === PANEL_BUCKET ? '' : String(bucketNumber);
    const counts = new Map<string, number>();
    for (const l of own) {
      const p = TAG_PREFIX[l.category as Category]!;
      counts.set(p, (counts.get(p) ?? 0) + (l.category === 'terminal-block' ? 1 : Math.ceil(l.quantity)));
    }
    const seen = new Map<string, number>();
    const nextTag = (category: Category): string => {
      const p = TAG_PREFIX[category]!;
      const n = (seen.get(p) ?? 0) + 1;
      seen.set(p, n);
      return (counts.get(p) ?? 0) > 1 ? `${prefix}${p}${n}` : `${prefix}${p}`;
    };
    // the bucket's terminal strip, named as the schematic and the terminal plan name it (TB1, TB2 …)
    const stripTag = `TB${bucket === PANEL_BUCKET ? 0 : bucketNumber}`;
    let terminalNumber = 0;
    const contactorUnits: LayoutUnit[] = [];
    for (const l of own) {
      const category = l.category as Category;
      const item = l.code ? itemOf(l.code) : undefined;
      const quantity = Math.ceil(l.quantity);
      if (category === 'terminal-block') {
        const first = terminalNumber + 1;
        terminalNumber += quantity;
        const part = item ? partOf(item, stripTag) : null;
        if (!item || !part) {
          unplaced.push(unplacedOf(`${stripTag}:${first}–${terminalNumber}`, bucket, l, item));
          continue;
        }
        for (let n = first; n <= terminalNumber; n++)
          terminals.push(unitOf(bucket, item, [{ ...part, tag: `${stripTag}:${n}` }], stripTag));
        continue;
      }
      for (let q = 0; q < quantity; q++) {
        const tag = nextTag(category);
        const part = item ? partOf(item, tag) : null;
        if (!item || !part) {
          unplaced.push(unplacedOf(tag, bucket, l, item));
          continue;
        }
        // a direct-mounted overload relay hangs under the bucket's first contactor (common practice)
        const carrier = category === 'overload-relay' ? contactorUnits.find((u) => u.parts.length === 1) : undefined;
        if (carrier) {
          carrier.parts.push(part);
          carrier.widthMm = Math.max(carrier.widthMm, part.widthMm);
          carrier.heightMm += part.heightMm;
          carrier.depthMm = Math.max(carrier.depthMm, part.depthMm);
          continue;
        }
        const unit = unitOf(bucket, item, [part], null);
        if (category === 'contactor') contactorUnits.push(unit);
        units.push(unit);
      }
    }
  }
  return { units: [...units, ...terminals], unplaced };
}

function unplacedOf(tag: string, bucket: string, l: BomLine, item: CatalogueItem | undefined): UnplacedPart {
  const reason = !l.code
    ? 'no catalogue part matched, so no dimensions to lay it out by'
    : !item
      ? `${l.code} is no longer in the catalogue`
      : `${l.code} has no width, height and depth in the catalogue`;
  return { tag, bucket, code: l.code, category: l.category as Category, description: l.description, reason };
}
