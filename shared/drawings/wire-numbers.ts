// Wire numbers of a bucket's ladder: the fused rail first, X2 for the grounded side, then every node in
// reading order (row by row, left to right), continuing the bucket's sequence after the power circuit.
// Pure TypeScript.
import type { LadderLayout, PlacedElement } from './ladder';

/** the wire number of each ladder node id, and the elements in reading order */
export function numberLadderNodes(layout: LadderLayout, nextWire: () => string): { nodeWire: string[]; order: PlacedElement[] } {
  const nodeWire: string[] = new Array(layout.nodeCount).fill('');
  nodeWire[0] = nextWire();
  nodeWire[1] = 'X2';
  const order = [...layout.elements].sort((a, z) => a.row - z.row || a.col - z.col);
  for (const e of order) for (const n of [e.left, e.right]) if (!nodeWire[n]) nodeWire[n] = nextWire();
  return { nodeWire, order };
}
