// Heat load of a panel by the simplified method of IEC TR 60890 (temperature rise by the effective
// cooling surface): ΔT = P / (k · Ae), k = 5.5 W/(m²·K) for painted sheet steel in still air.
// Surface factors b per face (IEC TR 60890, written from memory):
//   top exposed 1.4 · top covered 0.7 · front, back and sides exposed 0.9 ·
//   a side or back covered (against a wall or a neighbouring section) 0.5 · floor not counted.

import { roundHalfUp } from './round';

export type EnclosureMounting =
  | 'free-standing'
  | 'wall-mounted'
  | 'row-end-free-standing'
  | 'row-end-wall-mounted'
  | 'row-middle-free-standing'
  | 'row-middle-wall-mounted';

export const SURFACE_FACTOR = {
  topExposed: 1.4,
  topCovered: 0.7,
  sideExposed: 0.9,
  sideCovered: 0.5,
  floor: 0,
} as const; // IEC TR 60890, from memory

/** Heat transfer coefficient of painted sheet steel, W/(m²·K) — IEC TR 60890 simplified method. */
export const K_PAINTED_STEEL = 5.5;

/** Filter-fan airflow: cfm ≈ 3.16 × W / ΔT(°F) — common practice (sea level). */
export const FAN_CFM_FACTOR = 3.16;
const M3H_PER_CFM = 1.699;

export interface EnclosureDims {
  heightM: number;
  widthM: number;
  depthM: number;
  mounting: EnclosureMounting;
  /** top covered (e.g. by a canopy or a structure close above) */
  topCovered?: boolean;
}

export interface SurfaceFace {
  face: 'top' | 'front' | 'back' | 'left' | 'right';
  areaM2: number;
  factor: number;
  effectiveM2: number;
}

/** Effective cooling surface Ae = Σ A0 · b (IEC TR 60890), m², with the face-by-face breakdown. */
export function effectiveCoolingSurface(e: EnclosureDims): { aeM2: number; faces: SurfaceFace[] } {
  const { heightM: h, widthM: w, depthM: d } = e;
  if (!(h > 0 && w > 0 && d > 0)) throw new RangeError('enclosure dimensions must be positive');
  const backCovered = e.mounting.endsWith('wall-mounted');
  const sidesCovered = e.mounting.startsWith('row-middle') ? 2 : e.mounting.startsWith('row-end') ? 1 : 0;
  const faces: Array<Omit<SurfaceFace, 'effectiveM2'>> = [
    { face: 'top', areaM2: w * d, factor: e.topCovered ? SURFACE_FACTOR.topCovered : SURFACE_FACTOR.topExposed },
    { face: 'front', areaM2: h * w, factor: SURFACE_FACTOR.sideExposed },
    { face: 'back', areaM2: h * w, factor: backCovered ? SURFACE_FACTOR.sideCovered : SURFACE_FACTOR.sideExposed },
    { face: 'left', areaM2: h * d, factor: sidesCovered >= 1 ? SURFACE_FACTOR.sideCovered : SURFACE_FACTOR.sideExposed },
    { face: 'right', areaM2: h * d, factor: sidesCovered >= 2 ? SURFACE_FACTOR.sideCovered : SURFACE_FACTOR.sideExposed },
  ];
  const withEff = faces.map((f) => ({ ...f, effectiveM2: f.areaM2 * f.factor }));
  return { aeM2: withEff.reduce((s, f) => s + f.effectiveM2, 0), faces: withEff };
}

/** A heat source in the panel: catalogue loss, or a drive / soft starter taken at its load. */
export interface HeatSourceInput {
  /** the bucket's tag; null for panel-wide parts (CPT, power supplies, main) */
  bucketTag: string | null;
  code: string;
  description: string;
  category: string;
  qty?: number;
  /** catalogue heat loss at rated current, W */
  heatLossW?: number;
  /** rated current of the part, A (for scaling to the load) */
  ratedAmps?: number;
  /** the motor's running current through the part, A */
  loadAmps?: number;
  /** drive throughput at load, kW (used when a drive has no catalogue loss) */
  throughputKw?: number;
  /** soft starter running with its bypass closed */
  bypassed?: boolean;
}

export interface HeatSourceResult {
  bucketTag: string | null;
  code: string;
  description: string;
  watts: number;
  basis: string;
}

/** Drive losses when the catalogue gives none: 3 % of throughput (common practice: 2–3 %). */
export const VFD_LOSS_FRACTION = 0.03;
/** Soft starter running on its SCRs (no bypass): about 3 W per ampere (common practice). */
export const SOFT_STARTER_W_PER_A = 3;

export function sourceLoss(s: HeatSourceInput): HeatSourceResult {
  const qty = s.qty ?? 1;
  const base = { bucketTag: s.bucketTag, code: s.code, description: s.description };
  const atLoad = s.category === 'vfd' || s.category === 'soft-starter';
  if (s.category === 'soft-starter' && s.loadAmps !== undefined && !s.bypassed && s.heatLossW === undefined) {
    return {
      ...base,
      watts: qty * SOFT_STARTER_W_PER_A * s.loadAmps,
      basis: `${SOFT_STARTER_W_PER_A} W/A at ${s.loadAmps} A (common practice)`,
    };
  }
  if (s.heatLossW !== undefined) {
    if (atLoad && s.ratedAmps && s.loadAmps !== undefined) {
      const f = Math.min(s.loadAmps / s.ratedAmps, 1);
      return {
        ...base,
        watts: qty * s.heatLossW * f,
        basis: `catalogue loss ${s.heatLossW} W × load ${s.loadAmps}/${s.ratedAmps} A (linear scaling, common practice)`,
      };
    }
    return { ...base, watts: qty * s.heatLossW, basis: 'catalogue heat loss' };
  }
  if (s.category === 'vfd' && s.throughputKw !== undefined) {
    return {
      ...base,
      watts: qty * s.throughputKw * 1000 * VFD_LOSS_FRACTION,
      basis: `${VFD_LOSS_FRACTION * 100} % of ${s.throughputKw} kW throughput (common practice)`,
    };
  }
  return { ...base, watts: 0, basis: 'no heat loss data: counted as 0 W — add the catalogue value' };
}

export interface HeatInput {
  enclosure: EnclosureDims;
  sources: HeatSourceInput[];
  /** the job's ambient, °C */
  ambientC: number;
  /** the components' internal air limit, °C (default 40) */
  internalLimitC?: number;
  /** solar or other external heat gain, W (default none) */
  solarGainW?: number;
  /** heat transfer coefficient, default painted sheet steel */
  kWPerM2K?: number;
}

export interface HeatResult {
  aeM2: number;
  faces: SurfaceFace[];
  k: number;
  totalLossW: number;
  sources: HeatSourceResult[];
  /** heat by bucket for the chart; the panel-wide parts under "Panel" */
  byBucket: Array<{ bucketTag: string; watts: number }>;
  deltaTK: number;
  internalTempC: number;
  internalLimitC: number;
  ambientC: number;
  exceeded: boolean;
  /** allowed rise limit − ambient, K (may be ≤ 0) */
  allowedRiseK: number;
  /** what the surface passes at the allowed rise, W */
  surfaceDissipationW: number;
  cooling: null | {
    /** excess heat to remove, W */
    excessW: number;
    /** filter fan: null where a fan cannot do it (ambient ≥ limit) */
    fan: null | { cfm: number; m3h: number; basis: string };
    airConditionerW: number;
    basis: string;
  };
  basis: string;
  notes: string[];
}

const round = roundHalfUp;

export function calculateHeat(input: HeatInput): HeatResult {
  const k = input.kWPerM2K ?? K_PAINTED_STEEL;
  const limit = input.internalLimitC ?? 40;
  const solar = input.solarGainW ?? 0;
  const { aeM2, faces } = effectiveCoolingSurface(input.enclosure);
  const sources = input.sources.map(sourceLoss);
  const totalLossW = sources.reduce((s, x) => s + x.watts, 0);
  const buckets = new Map<string, number>();
  for (const s of sources) {
    const key = s.bucketTag ?? 'Panel';
    buckets.set(key, (buckets.get(key) ?? 0) + s.watts);
  }
  const heatIn = totalLossW + solar;
  const deltaTK = heatIn / (k * aeM2);
  const internalTempC = input.ambientC + deltaTK;
  const allowedRiseK = limit - input.ambientC;
  const surfaceDissipationW = k * aeM2 * allowedRiseK;
  const exceeded = internalTempC > limit;
  const notes: string[] = [];
  if (sources.some((s) => s.watts === 0)) notes.push('Some parts have no heat loss data and count as 0 W.');
  notes.push('Simplified method: ΔT is the mean air rise; the top of the enclosure runs warmer.');

  let cooling: HeatResult['cooling'] = null;
  if (exceeded) {
    const excessW = heatIn - surfaceDissipationW;
    const riseF = allowedRiseK * 1.8;
    const fan =
      allowedRiseK > 0
        ? {
            cfm: round((FAN_CFM_FACTOR * excessW) / riseF, 1),
            m3h: round(((FAN_CFM_FACTOR * excessW) / riseF) * M3H_PER_CFM, 1),
            basis: `cfm ≈ 3.16 × ${round(excessW, 1)} W / ${round(riseF, 1)} °F (common practice)`,
          }
        : null;
    if (!fan) notes.push(`A filter fan cannot cool below the ambient (${input.ambientC} °C ≥ limit ${limit} °C): use an air conditioner.`);
    notes.push('A filter fan breaks a Type 4, 4X or 12 rating unless the fan and filter carry the same rating (NEMA 250).');
    cooling = {
      excessW: round(excessW, 1),
      fan,
      airConditionerW: round(excessW, 1),
      basis: `excess = losses ${round(totalLossW, 1)} W + solar ${solar} W − k·Ae·(limit − ambient) ${round(surfaceDissipationW, 1)} W`,
    };
  }

  return {
    aeM2,
    faces,
    k,
    totalLossW,
    sources,
    byBucket: [...buckets.entries()].map(([bucketTag, watts]) => ({ bucketTag, watts })),
    deltaTK,
    internalTempC,
    internalLimitC: limit,
    ambientC: input.ambientC,
    exceeded,
    allowedRiseK,
    surfaceDissipationW,
    cooling,
    basis: `IEC TR 60890 simplified method: ΔT = P / (k · Ae), k = ${k} W/(m²·K)`,
    notes,
  };
}
