// The checks' and the one-line's view of three motors on one drive (FLC from NEC 2023 Table 430.250 at 460 V:
// 10 hp 14 A, 7.5 hp 11 A, 5 hp 7.6 A; the drive's input device 250 % × 32.6 = 81.5 A -> 90 A, NEC 2023 430.130(A)(1)).
import { describe, expect, it } from 'vitest';
import { sharedDriveCheck } from '../../../shared/calc/checks/shared-drive-check';
import { oneLineElements } from '../../../shared/calc/one-line';
import { sharedDriveOf, sharedDriveOneLine } from '../../../shared/calc/shared-drive-one-line';
import { motor, selector, supply480 } from '../engine/selector-setup';

const onDrive = (tag: string, hp: number) => motor({ tag, hp, speedControl: 'variable', sharedDrive: 'VFD-1' });

describe('a panel with VFD-1 feeding P-1, P-2, P-3', async () => {
  const out = await selector.selectPanel({ supply: supply480, loads: [onDrive('P-1', 10), onDrive('P-2', 7.5), onDrive('P-3', 5)] });

  it('the check lists the drive with its sums and each motor with its overload, contactor and conductors', () => {
    const c = sharedDriveCheck(out.panel);
    expect(c.drives.map((d) => d.tag)).toEqual(['VFD-1']);
    expect(c.lines[0]).toMatch(/^VFD-1 feeds P-1, P-2, P-3 at 460 V: sum of FLC 32\.6 A, of FLA 32\.6 A; drive output at least 32\.6 A/);
    expect(c.lines[0]).toMatch(/input device 90 A inverse-time breaker \(430\.130\)/);
    expect(c.lines[1]).toMatch(/^P-1 on VFD-1: overload relay set 14 A, at most 16\.1 A \(115 %/); // NEC 2023 430.32(A)(1)
    expect(c.lines).toHaveLength(4);
    expect(c.errors).toEqual([]);
  });

  it('no shared drive: an empty check', () => {
    expect(sharedDriveCheck({ ...out.panel, sharedDrives: undefined })).toEqual({ drives: [], lines: [], errors: [] });
  });

  it("each motor's one-line goes through the drive, then its own interlocked output contactor and overload", () => {
    const s = out.results[1]!;
    const d = sharedDriveOf(out.panel, 'P-2');
    expect(d?.tag).toBe('VFD-1');
    const kinds = sharedDriveOneLine(s, d!).map((e) => e.kind);
    expect(kinds).toEqual(['bus', 'disconnect', 'breaker', 'vfd', 'bus', 'contactor', 'overload', 'motor']);
    const e = sharedDriveOneLine(s, d!);
    expect(e[2]?.label).toBe('90 A inverse-time breaker');
    expect(e[3]?.label).toBe('VFD-1 — shared drive (feeds P-1, P-2, P-3)');
    expect(e[5]).toMatchObject({ interlocked: true, detail: "AC-3 ≥ 11 A, interlocked with the drive's enable" });
    expect(e[6]?.detail).toBe('set 11 A, max 12.65 A (115 % FLA)'); // NEC 2023 430.32(A)(1): 1.15 × 11
    // a motor with its own drive keeps its own one-line (no overload relay: the drive's own serves)
    expect(oneLineElements(s).some((x) => x.kind === 'overload')).toBe(false);
    expect(sharedDriveOf(out.panel, 'P-9')).toBeNull();
  });
});
