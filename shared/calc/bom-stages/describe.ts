// The requirement in words: what an unmatched line needs, and the figures the match's shortfalls quote.
import { CATEGORY_LABELS, type Requirement } from '../../schemas/catalogue';
import { round2 } from '../round';

/** A figure as the bill of materials writes it: two decimals at most, half up. */
export const fmt = (n: number): string => String(round2(n));

/** The requirement in words, for an unmatched line. */
export function describeRequirement(req: Requirement): string {
  const p: string[] = [];
  if (req.kind) p.push(req.kind);
  if (req.function) p.push(`function ${req.function}`);
  if (req.nemaSize) p.push(`NEMA size ${req.nemaSize}`);
  if (req.minIecAc3Amps !== undefined) p.push(`AC-3 ≥ ${fmt(req.minIecAc3Amps)} A`);
  if (req.minIecAc4Amps !== undefined) p.push(`AC-4 ≥ ${fmt(req.minIecAc4Amps)} A`);
  if (req.coilVolts !== undefined) p.push(`coil ${fmt(req.coilVolts)} V`);
  if (req.exactVolts !== undefined) p.push(`operating at ${fmt(req.exactVolts)} V`);
  if (req.exactAmps !== undefined) p.push(`rating ${fmt(req.exactAmps)} A`);
  if (req.minAmps !== undefined) p.push(`≥ ${fmt(req.minAmps)} A`);
  if (req.maxAmps !== undefined) p.push(`≤ ${fmt(req.maxAmps)} A`);
  if (req.settingAmps !== undefined) p.push(`setting range holding ${fmt(req.settingAmps)} A`);
  if (req.maxTripSettingAmps !== undefined) p.push(`instantaneous trip settable ≤ ${fmt(req.maxTripSettingAmps)} A`);
  if (req.tripClass !== undefined) p.push(`trip class ${req.tripClass}`);
  if (req.minHp) p.push(`≥ ${fmt(req.minHp.hp)} hp at ${req.minHp.volts} V`);
  if (req.minNormalDutyAmps !== undefined) p.push(`normal-duty output ≥ ${fmt(req.minNormalDutyAmps)} A`);
  if (req.minHeavyDutyAmps !== undefined) p.push(`heavy-duty output ≥ ${fmt(req.minHeavyDutyAmps)} A`);
  if (req.poles !== undefined) p.push(`${req.poles}-pole`);
  if (req.minPoles !== undefined) p.push(`≥ ${req.minPoles} poles`);
  if (req.fuseClass) p.push(`class ${req.fuseClass}`);
  if (req.timeDelay !== undefined) p.push(req.timeDelay ? 'time-delay' : 'non-time-delay');
  if (req.contacts) p.push(req.contacts);
  if (req.detectsPhaseLoss) p.push('detects phase loss');
  if (req.detectsPhaseReversal) p.push('detects phase reversal');
  if (req.detectsImbalance) p.push('detects imbalance');
  if (req.internalBypass) p.push('internal bypass');
  if (req.builtInOverload) p.push('built-in overload');
  if (req.minVa !== undefined) p.push(`≥ ${fmt(req.minVa)} VA continuous`);
  if (req.minInrushVa !== undefined) p.push(`inrush capability ≥ ${fmt(req.minInrushVa)} VA`);
  if (req.secondaryVolts !== undefined) p.push(`secondary ${fmt(req.secondaryVolts)} V`);
  if (req.wireSize) p.push(req.category === 'terminal-block' ? `accepts ${req.wireSize}` : `size ${req.wireSize}`);
  if (req.nemaType) p.push(req.category === 'cooling' ? `keeps NEMA Type ${req.nemaType}` : `NEMA Type ${req.nemaType}`);
  if (req.minCfm !== undefined) p.push(`≥ ${fmt(req.minCfm)} cfm`);
  if (req.minCoolingW !== undefined) p.push(`≥ ${fmt(req.minCoolingW)} W cooling`);
  if (req.minUsableAreaMm2 !== undefined) p.push(`usable back panel ≥ ${fmt(req.minUsableAreaMm2 / 1e6)} m²`);
  if (req.minDepthMm !== undefined) p.push(`depth ≥ ${fmt(req.minDepthMm)} mm`);
  if (req.volts !== undefined) p.push(`rated for ${fmt(req.volts)} V`);
  return `${CATEGORY_LABELS[req.category]}: ${p.join('; ')}`;
}
