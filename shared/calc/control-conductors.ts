// Control-circuit conductor protection, NEC 2023 430.72(A) and (B) with Table 430.72(B): every control
// conductor of the bill of materials against the device that protects it. The transformer side,
// 430.72(C), is sized in control-power.ts.
//
// How the bill of materials wires control (shared/calc/bom.ts): each bucket's control circuit runs from
// its own control fuse (one fuse, one 1-pole holder), fed from the control transformer's secondary
// fuse; the bucket's control wire also runs to its field terminals, so it extends beyond the enclosure.
// - behind a control fuse or the transformer's secondary fuse: separate protection, column A (430.72(B)(1));
// - with neither, the control circuit is taken as tapped from the motor's branch short-circuit and
//   ground-fault protective device (430.72(B)(2)): column C as it leaves the enclosure (column B holds
//   only where every conductor stays inside).
// Which line is the control fuse is read from the bill of materials: in a motor bucket, the single fuse
// (quantity 1) with the lowest rating; in the panel's own items, the single fuse of the transformer's
// secondary. A catalogue item without an ampere rating leaves the conductor unchecked, said so.

import { PANEL_BUCKET, type BomLine, type CatalogueItem } from '../schemas/catalogue';
import type { LoadSelection } from '../schemas/selection';
import type { ConductorMaterial } from '../standards/nec-table-310-16';
import { CONTROL_COLUMN_WORDS, controlConductorMaxAmps, controlConductorSize, type ControlColumn } from '../standards/nec-table-430-72-b';
import { DomainError } from '../errors';

export interface ControlConductorInput {
  size: string;
  material: ConductorMaterial;
  column: ControlColumn;
  /** rating of the protecting device, A */
  deviceAmps: number;
}

export interface ControlConductorVerdict {
  maxAmps: number | null;
  ok: boolean | null;
  basis: string;
  finding: string | null;
}

/** One control conductor against its protecting device (430.72(B), Table 430.72(B)). */
export function checkControlConductor(c: ControlConductorInput): ControlConductorVerdict {
  const label = `${controlConductorSize(c.size)} ${c.material === 'cu' ? 'Cu' : 'Al'}`;
  try {
    const lim = controlConductorMaxAmps(c.size, c.material, c.column);
    const ok = c.deviceAmps <= lim.maxAmps + 1e-9;
    return {
      maxAmps: lim.maxAmps,
      ok,
      basis: lim.basis,
      finding: ok
        ? null
        : `${label} behind a ${c.deviceAmps} A device: ${CONTROL_COLUMN_WORDS[c.column]} allows at most ${lim.maxAmps} A — fit a smaller fuse or a larger conductor (430.72(B)).`,
    };
  } catch (e) {
    if (!(e instanceof DomainError)) throw e;
    return { maxAmps: null, ok: null, basis: e.message, finding: `${label}: not checked, ${e.message}` };
  }
}

export interface ControlConductorRow {
  bucket: string;
  conductor: string;
  material: ConductorMaterial;
  run: 'within' | 'beyond';
  device: {
    description: string;
    code: string | null;
    amps: number | null;
    kind: 'control fuse' | 'transformer secondary fuse' | 'branch protective device';
  };
  column: ControlColumn;
  maxAmps: number | null;
  ok: boolean | null;
  basis: string;
  finding: string | null;
}

export interface ControlConductorCheck {
  rows: ControlConductorRow[];
  findings: string[];
  basis: string;
}

function wireSizeOf(line: BomLine, item: CatalogueItem | undefined): string | null {
  if (item?.ratings.wireSize) return String(item.ratings.wireSize);
  const m = line.requiredRatings?.match(/size (\d+(?:\/0)?)/);
  return m ? (m[1] as string) : null;
}

function singleFuse(lines: readonly BomLine[], byCode: ReadonlyMap<string, CatalogueItem>): { line: BomLine; amps: number | null } | null {
  const fuses = lines
    .filter((l) => l.category === 'fuse' && l.quantity === 1)
    .map((line) => ({ line, amps: line.code ? (byCode.get(line.code)?.ratings.amps ?? null) : null }));
  if (fuses.length === 0) return null;
  return fuses.sort((a, b) => (a.amps ?? Infinity) - (b.amps ?? Infinity))[0] as { line: BomLine; amps: number | null };
}

/** Every control conductor of a bill of materials checked against the device that protects it. */
export function controlConductorChecks(
  lines: readonly BomLine[],
  byCode: ReadonlyMap<string, CatalogueItem>,
  selections: readonly LoadSelection[],
  panelBucket = PANEL_BUCKET,
): ControlConductorCheck {
  const rows: ControlConductorRow[] = [];
  const bySel = new Map(selections.map((s) => [s.tag, s]));
  const buckets = new Map<string, BomLine[]>();
  for (const l of lines) buckets.set(l.bucket, [...(buckets.get(l.bucket) ?? []), l]);
  const secondary = singleFuse(buckets.get(panelBucket) ?? [], byCode);
  for (const [bucket, own] of buckets) {
    if (bucket === panelBucket) continue;
    const wires = own.filter(
      (l) => l.category === 'wire' && (l.code ? byCode.get(l.code)?.ratings.kind === 'control' : /control/i.test(l.requiredRatings ?? '')),
    );
    if (wires.length === 0) continue;
    const fuse = singleFuse(own, byCode);
    const sel = bySel.get(bucket);
    for (const w of wires) {
      const raw = wireSizeOf(w, w.code ? byCode.get(w.code) : undefined);
      if (!raw) continue;
      const size = controlConductorSize(raw);
      let device: ControlConductorRow['device'];
      let column: ControlColumn;
      if (fuse) {
        device = { description: fuse.line.description, code: fuse.line.code, amps: fuse.amps, kind: 'control fuse' };
        column = 'A';
      } else if (secondary) {
        device = {
          description: secondary.line.description,
          code: secondary.line.code,
          amps: secondary.amps,
          kind: 'transformer secondary fuse',
        };
        column = 'A';
      } else {
        device = {
          description: sel ? `branch ${sel.scpd.type.replace(/-/g, ' ')}` : 'branch protective device',
          code: null,
          amps: sel && sel.scpd.ratingAmps > 0 ? sel.scpd.ratingAmps : null,
          kind: 'branch protective device',
        };
        column = 'C';
      }
      const v: ControlConductorVerdict =
        device.amps === null
          ? {
              maxAmps: null,
              ok: null,
              basis: 'the protecting device has no ampere rating in the catalogue',
              finding: `${bucket}: ${size} Cu control wire not checked, the rating of ${device.description} is not known`,
            }
          : checkControlConductor({ size, material: 'cu', column, deviceAmps: device.amps });
      rows.push({
        bucket,
        conductor: size,
        material: 'cu',
        run: 'beyond',
        device,
        column,
        maxAmps: v.maxAmps,
        ok: v.ok,
        basis: v.basis,
        finding: v.finding && device.amps !== null ? `${bucket}: ${v.finding}` : v.finding,
      });
    }
  }
  return {
    rows,
    findings: rows.flatMap((r) => (r.finding ? [r.finding] : [])),
    basis:
      'NEC 2023 430.72(A), 430.72(B), Table 430.72(B) (values from memory); control wire of each bucket taken to its field terminals (extending beyond the enclosure, common practice)',
  };
}
