// The control circuit of a bucket as a ladder: series-parallel networks between the bucket's fused
// control rail (fed from X1) and the grounded rail X2, laid out on a grid of lines (rungs), with a wire
// number for every electrically distinct node and cross-references between coils and their contacts.
// Symbols and reference designations follow IEEE 315 / NEMA ICS 19 practice (ladder with horizontal
// rungs, coil at the right, the overload contact between the coil and the grounded rail, NFPA 79
// 9.1.4 as remembered). Pure TypeScript.

export type ContactKind = 'no' | 'nc' | 'no-tc' | 'nc-to';

export type Element =
  | { kind: 'contact'; device: string; contact: ContactKind; label?: string }
  | { kind: 'overload'; device: string; label?: string }
  | { kind: 'push'; device: string; contact: 'no' | 'nc'; label: string }
  | { kind: 'selector'; device: string; position: 'H' | 'A'; label: string }
  | { kind: 'field'; label: string; terminals: [string, string]; maintained?: boolean }
  | { kind: 'coil'; device: string; label: string }
  | { kind: 'light'; device: string; colour: 'R' | 'G' | 'A'; label: string }
  | { kind: 'input'; device: string; label: string }
  | { kind: 'terminal'; label: string }
  | { kind: 'fuse'; device: string; label: string };

export type Net = { kind: 'series'; items: Net[] } | { kind: 'par'; alts: Net[] } | { kind: 'el'; el: Element };

export const el = (e: Element): Net => ({ kind: 'el', el: e });
export const ser = (...items: Net[]): Net => ({ kind: 'series', items });
export const par = (...alts: Net[]): Net => ({ kind: 'par', alts });

/** One circuit between the rails (or between two terminals where both ends are open). */
export interface Circuit {
  body: Net;
  /** rail: from the bucket's fused rail to X2; open: an isolated circuit (dry contact to the plant, drive input) */
  ends: 'rail' | 'open';
  /** a note printed at the right of the circuit's first line */
  note?: string;
}

export interface PlacedElement {
  el: Element;
  row: number;
  col: number;
  /** node ids at its left and right */
  left: number;
  right: number;
}

export interface Wire {
  /** node id */
  node: number;
  /** straight segment in grid units: from (col,row) to (col,row) */
  x1: number;
  y1: number;
  x2: number;
  y2: number;
}

export interface LadderLayout {
  rows: number;
  cols: number;
  elements: PlacedElement[];
  wires: Wire[];
  /** rows that start at the left rail and end at X2 */
  railRows: Array<{ row: number; left: boolean; right: boolean }>;
  /** dots where branches meet */
  junctions: Array<{ x: number; y: number }>;
  /** node ids of the rails */
  railNode: number;
  x2Node: number;
  nodeCount: number;
  /** first row of each circuit and its note */
  notes: Array<{ row: number; text: string }>;
}

const widthOf = (n: Net): number =>
  n.kind === 'el' ? 1 : n.kind === 'series' ? n.items.reduce((a, x) => a + widthOf(x), 0) : Math.max(...n.alts.map(widthOf));
const heightOf = (n: Net): number =>
  n.kind === 'el' ? 1 : n.kind === 'series' ? Math.max(1, ...n.items.map(heightOf)) : n.alts.reduce((a, x) => a + heightOf(x), 0);
const endsInCoil = (n: Net): boolean => {
  if (n.kind === 'el') return n.el.kind === 'coil' || n.el.kind === 'light' || n.el.kind === 'input';
  if (n.kind === 'series') return n.items.length > 0 && endsInCoil(n.items[n.items.length - 1]!);
  return false;
};

/**
 * Lay the circuits out on one grid of `cols` columns: coils and lights flush right before the overload
 * column, each circuit below the last. Node ids: 0 the fused rail, 1 X2, then one per distinct node.
 */
export function layoutLadder(circuits: readonly Circuit[]): LadderLayout {
  const cols = Math.max(4, ...circuits.map((c) => widthOf(c.body)));
  const elements: PlacedElement[] = [];
  const wires: Wire[] = [];
  const junctions: Array<{ x: number; y: number }> = [];
  const railRows: LadderLayout['railRows'] = [];
  const notes: LadderLayout['notes'] = [];
  let next = 2;
  const fresh = () => next++;

  /** place net n from column x (row y) to column x+w, between nodes a and b */
  function place(n: Net, x: number, y: number, w: number, a: number, b: number): void {
    if (n.kind === 'el') {
      elements.push({ el: n.el, row: y, col: x + w - 1, left: a, right: b });
      if (w > 1) wires.push({ node: a, x1: x, y1: y, x2: x + w - 1, y2: y });
      return;
    }
    if (n.kind === 'series') {
      const ws = n.items.map(widthOf);
      const total = ws.reduce((s, v) => s + v, 0);
      const extra = w - total;
      // the slack goes before the last item when it is a coil (coils flush right), else after the last
      const coilLast = n.items.length > 0 && endsInCoil(n.items[n.items.length - 1]!);
      let cx = x;
      let left = a;
      n.items.forEach((item, i) => {
        const last = i === n.items.length - 1;
        let iw = ws[i]!;
        if (last && extra > 0) {
          if (coilLast && item.kind === 'el') {
            wires.push({ node: left, x1: cx, y1: y, x2: cx + extra, y2: y });
            cx += extra;
          } else iw += extra;
        }
        const right = last ? b : fresh();
        place(item, cx, y, iw, left, right);
        cx += iw;
        left = right;
      });
      if (n.items.length === 0) wires.push({ node: a, x1: x, y1: y, x2: x + w, y2: y });
      return;
    }
    // parallel: each alternative on its own rows, joined by vertical wires at both ends
    let yy = y;
    n.alts.forEach((alt, i) => {
      if (i > 0) {
        wires.push({ node: a, x1: x, y1: y, x2: x, y2: yy });
        wires.push({ node: b, x1: x + w, y1: y, x2: x + w, y2: yy });
        junctions.push({ x, y }, { x: x + w, y });
      }
      place(alt, x, yy, w, a, b);
      yy += heightOf(alt);
    });
  }

  let row = 0;
  for (const c of circuits) {
    const a = c.ends === 'rail' ? 0 : fresh();
    const b = c.ends === 'rail' ? 1 : fresh();
    const h = heightOf(c.body);
    if (c.note) notes.push({ row, text: c.note });
    place(c.body, 0, row, cols, a, b);
    for (let r = row; r < row + h; r++) railRows.push({ row: r, left: false, right: false });
    if (c.ends === 'rail') railRows[railRows.length - h]!.left = railRows[railRows.length - h]!.right = true;
    row += h;
  }
  return { rows: row, cols, elements, wires, railRows, junctions, railNode: 0, x2Node: 1, nodeCount: next, notes };
}

/** Paths of a circuit through a coil: every series path from the rail to X2 as a list of elements. */
export function railPaths(layout: LadderLayout): PlacedElement[][] {
  const byLeft = new Map<number, PlacedElement[]>();
  for (const e of layout.elements) {
    const l = byLeft.get(e.left) ?? [];
    l.push(e);
    byLeft.set(e.left, l);
  }
  const out: PlacedElement[][] = [];
  const walk = (node: number, path: PlacedElement[]) => {
    if (node === layout.x2Node) {
      out.push(path);
      return;
    }
    for (const e of byLeft.get(node) ?? []) if (!path.includes(e)) walk(e.right, [...path, e]);
  };
  walk(layout.railNode, []);
  return out;
}
