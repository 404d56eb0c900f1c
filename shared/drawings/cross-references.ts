// Cross-references: every coil's rung and the rungs of its normally open and normally closed contacts.
// Pure TypeScript.
import type { LadderLayout } from './ladder';
import type { CrossRef } from './schematic-model';

export function crossReferences(layout: LadderLayout, firstRung: number): CrossRef[] {
  const coils = new Map<string, CrossRef>();
  for (const e of layout.elements)
    if (e.el.kind === 'coil') coils.set(e.el.device, { device: e.el.device, coilRung: firstRung + e.row, no: [], nc: [] });
  for (const e of layout.elements) {
    if (e.el.kind !== 'contact') continue;
    const x = coils.get(e.el.device);
    if (!x) continue;
    (e.el.contact === 'no' || e.el.contact === 'no-tc' ? x.no : x.nc).push(firstRung + e.row);
  }
  return [...coils.values()];
}
