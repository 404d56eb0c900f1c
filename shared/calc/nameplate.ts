// Industrial control panel nameplate (NEC 2023 409.110) and the feeder / main disconnect of the panel
// (NEC 2023 409.20 conductors, 409.21 overcurrent protection, 430.110(C) disconnect for combined loads),
// from the selection engine's PanelRollup.
import type { PanelRollup } from '../schemas/selection';
import { round2 } from './round';

/** Common ampere sizes of enclosed / panel-mount disconnect switches (common practice). */
export const DISCONNECT_SWITCH_SIZES = [30, 60, 100, 200, 400, 600, 800, 1200] as const;

export interface NameplateInput {
  rollup: PanelRollup;
  supply: { volts: number; phases: 1 | 3 | 'dc'; hz: 50 | 60 | null };
  /** non-motor loads that may run at once with the motors (heaters, lighting, control), A */
  otherLoadsAmps?: number;
  /** the panel SCCR from the SCCR worksheet, kA (null when not established) */
  sccrKa: number | null;
  /** NEMA 250 enclosure type, e.g. "12" or "4X" */
  enclosureType: string;
  /** the shop's name (manufacturer line); a placeholder until the organisation sets it */
  shopName?: string;
  wiringDiagramRef?: string;
}

export interface NameplateLine {
  label: string;
  value: string;
  basis: string;
}

export interface PanelFeeder {
  conductor: { minAmpacity: number; size: string; basis: string };
  supplyProtection: { maxAmps: number; basis: string };
  mainDisconnect: { minAmps: number; sizeAmps: number; basis: string };
}

export interface NameplateResult {
  fullLoadAmps: number;
  lines: NameplateLine[];
  feeder: PanelFeeder;
  /** the printable label's text, one line each */
  label: string[];
  warnings: string[];
}

export const SHOP_NAME_PLACEHOLDER = '[Shop name]';

const fmt = (x: number) => (Math.round(x * 10) / 10).toString();

/** The transformers' and DC supplies' primary currents the roll-up counts for motors at another voltage, A. */
export function otherSourcesAmps(rollup: PanelRollup): number {
  return rollup.otherLoadsAmps ?? 0;
}

export function panelFeeder(rollup: PanelRollup, otherLoadsAmps = 0): PanelFeeder {
  const total = rollup.totalFlcAmps + otherSourcesAmps(rollup) + otherLoadsAmps;
  const minAmps = total * 1.15;
  const needed = Math.max(minAmps, rollup.feeder.ocpdMaxAmps);
  const sizeAmps = DISCONNECT_SWITCH_SIZES.find((s) => s >= needed);
  if (sizeAmps === undefined) throw new RangeError(`main disconnect above ${DISCONNECT_SWITCH_SIZES.at(-1)} A`);
  return {
    conductor: {
      minAmpacity: rollup.feeder.minAmpacity,
      size: rollup.feeder.conductorSize,
      basis: `NEC 2023 409.20 (sized per 430.24): ${rollup.feeder.basis}`,
    },
    supplyProtection: {
      maxAmps: rollup.feeder.ocpdMaxAmps,
      basis: 'NEC 2023 409.21 (rating per 430.62(A); ahead of the panel or a main device in it)',
    },
    mainDisconnect: {
      minAmps: round2(minAmps),
      sizeAmps,
      basis:
        'NEC 2023 430.110(C)(1): ≥ 115 % of the sum of the full-load currents; a fused switch also holds the supply fuses (common practice: next switch size)',
    },
  };
}

export function panelNameplate(input: NameplateInput): NameplateResult {
  const other = input.otherLoadsAmps ?? 0;
  const sources = otherSourcesAmps(input.rollup);
  const fullLoadAmps = Math.round((input.rollup.totalFlcAmps + sources + other) * 10) / 10;
  const phases = input.supply.phases === 'dc' ? 'DC' : `${input.supply.phases} phase`;
  const warnings: string[] = [];
  const shop = input.shopName?.trim() ? input.shopName.trim() : SHOP_NAME_PLACEHOLDER;
  if (shop === SHOP_NAME_PLACEHOLDER) warnings.push('Set the shop name: 409.110(1) needs the manufacturer’s name or mark.');
  if (input.sccrKa === null) warnings.push('Panel SCCR not established: 409.110(3) needs it on the nameplate.');
  const lines: NameplateLine[] = [
    { label: 'Manufacturer', value: shop, basis: 'NEC 2023 409.110(1)' },
    { label: 'Supply voltage', value: `${input.supply.volts} V`, basis: 'NEC 2023 409.110(2)' },
    { label: 'Phases', value: phases, basis: 'NEC 2023 409.110(2)' },
    {
      label: 'Frequency',
      value: input.supply.hz === null ? 'DC' : `${input.supply.hz} Hz`,
      basis: 'NEC 2023 409.110(2)',
    },
    {
      label: 'Full-load current',
      value: `${fmt(fullLoadAmps)} A`,
      basis: `NEC 2023 409.110(2): sum of the motors’ full-load currents and the other loads that may run at once${sources > 0 ? ` (including ${fmt(sources)} A of primary current of the panel’s transformers and DC supplies for motors at another voltage: ${(input.rollup.otherSources ?? []).map((s) => s.tag).join(', ')})` : ''}${input.rollup.externalMotors?.length ? `; left out, fed from outside the panel: ${input.rollup.externalMotors.map((m) => m.tag).join(', ')}` : ''}`,
    },
    {
      label: 'Short-circuit current rating',
      value: input.sccrKa === null ? 'NOT ESTABLISHED' : `${fmt(input.sccrKa)} kA rms symmetrical, ${input.supply.volts} V`,
      basis: 'NEC 2023 409.110(3), UL 508A Supplement SB',
    },
    { label: 'Enclosure type', value: `Type ${input.enclosureType}`, basis: 'NEC 2023 409.110(6), NEMA 250' },
  ];
  if (input.wiringDiagramRef) lines.push({ label: 'Wiring diagram', value: input.wiringDiagramRef, basis: 'NEC 2023 409.110(5)' });
  return {
    fullLoadAmps,
    lines,
    feeder: panelFeeder(input.rollup, other),
    label: ['INDUSTRIAL CONTROL PANEL', ...lines.map((l) => `${l.label}: ${l.value}`)],
    warnings,
  };
}
