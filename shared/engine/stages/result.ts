// The LoadSelection from the stages' outputs: every part in its place, the cautions and the trace
// in the order the stages produced them (assumptions, decisions, sizing, cautions).

import type { AssumedInput, LoadSelection } from '../../schemas/selection';
import { nec } from '../../standards/code-edition';
import { UNDECIDED } from '../decisions';
import type { Assumptions } from './assumptions';
import type { Cautions } from './cautions';
import type { DecisionsStage } from './decide';
import type { CircuitSizing } from './sizing-conductors';
import type { MotorSizing } from './sizing-motor';
import type { ProtectionSizing } from './sizing-protection';
import type { StarterSizing } from './sizing-starter';
import { round2, type StageContext } from './stage';

export interface Stages {
  assumptions: Assumptions;
  decisions: DecisionsStage;
  starter: StarterSizing;
  protection: ProtectionSizing;
  circuit: CircuitSizing;
  motor: MotorSizing;
  cautions: Cautions;
}

export function selectionOf(ctx: StageContext, s: Stages): LoadSelection {
  const { load } = ctx;
  const { assumptions: a, decisions: d, starter, protection: p, circuit: c, motor: m } = s;
  const flc = a.flc;
  const decided = <K extends keyof typeof UNDECIDED>(k: K) => d.decisions[k] ?? UNDECIDED[k];
  const parts = [a, d, starter, p, c, m];
  const cond = c.conductor;
  const leads = c.leads;
  const scpd = p.scpd;
  const assumed: AssumedInput[] = [...a.assumed, ...c.assumed];
  return {
    tag: load.tag,
    ...(load.description !== undefined ? { description: load.description } : {}),
    supply: load.supply,
    hp: load.hp !== undefined || load.kw !== undefined ? round2(a.hp) : null,
    volts: load.volts,
    tableVolts: flc?.tableVolts ?? null,
    flcAmps: flc?.flcAmps ?? 0,
    flcSource: flc?.source ?? 'not determined',
    flaAmps: a.flaAmps ?? 0,
    lockedRotorAmps: m.lockedRotorAmps,
    synchronousRpm: m.synchronousRpm,
    starter: {
      type: d.starterType,
      nemaSize: starter.nemaSize,
      iecCategory: starter.iecCategory,
      iecAmps: starter.iecAmps,
      reversingContactors: decided('starter.reversingContactors'),
      interlock: decided('starter.interlock'),
      basis: d.ruleBasis('starter.type') + (starter.nemaBasis ? `; ${starter.nemaBasis}` : ''),
    },
    overload: {
      maxSettingAmps: flc && p.overload ? p.overload.maxSettingAmps : 0,
      maxPercent: p.overload?.maxPercent ?? 0,
      tripClass: d.decisions['overload.tripClass'] as 10 | 20 | 30,
      providedByDrive: decided('overload.providedByDrive'),
      basis: `${p.overload?.basis ?? nec(ctx.edition, '430.32(A)(1)')}; trip class: ${d.ruleBasis('overload.tripClass')}`,
      ...(p.relay ? { relay: p.relay } : {}),
    },
    scpd: scpd
      ? {
          type: scpd.type,
          maxPercent: scpd.maxPercent,
          ratingAmps: scpd.ratingAmps,
          computedMaxAmps: scpd.computedMaxAmps,
          basis: scpd.basis,
          ...(p.perWinding ? { perWinding: p.perWinding } : {}),
        }
      : { type: load.scpdType, maxPercent: 0, ratingAmps: 0, computedMaxAmps: 0, basis: 'not determined' },
    conductor: cond
      ? {
          minAmpacity: cond.minAmpacity,
          size: cond.size,
          material: cond.material,
          tempRatingC: cond.tempRatingC,
          ampacity: cond.ampacity,
          basis: cond.basis,
          ...(leads
            ? {
                motorLeads: {
                  count: leads.count,
                  share: leads.share,
                  minAmpacity: leads.minAmpacity,
                  size: leads.size,
                  ampacity: leads.ampacity,
                  basis: leads.basis,
                },
              }
            : {}),
          ...(c.voltageDrop ? { voltageDrop: c.voltageDrop } : {}),
          ...(c.termination60C
            ? {
                termination60C: {
                  size: c.termination60C.size,
                  ampacity: c.termination60C.ampacity,
                  minAmpacity: c.termination60C.minAmpacity,
                  basis: c.termination60C.basis,
                },
              }
            : {}),
        }
      : {
          minAmpacity: 0,
          size: 'not determined',
          material: load.conductor.material,
          tempRatingC: load.conductor.tempRatingC,
          ampacity: 0,
          basis: 'not determined',
        },
    disconnect: c.disconnect ?? { minAmps: 0, minHp: null, basis: 'not determined' },
    relays: {
      phaseLoss: decided('relays.phaseLoss'),
      phaseReversal: decided('relays.phaseReversal'),
      phaseLossByOverload: decided('relays.phaseLossByOverload'),
    },
    enclosure: {
      nemaType: d.decisions['enclosure.nemaType'] as string,
      ipCode: m.ipCode,
      flagForEngineer: decided('enclosure.flagForEngineer'),
    },
    vfd: m.vfd,
    softStarter: m.softStarter,
    dc: m.dc,
    controlScheme: load.controlScheme,
    unbalance: m.unbalance,
    cautions: [
      ...new Set([
        ...a.cautions,
        ...d.cautions,
        ...starter.cautions,
        ...s.cautions.protection,
        ...p.cautions,
        ...c.cautions,
        ...s.cautions.circuit,
        ...m.cautions,
        ...s.cautions.control,
      ]),
    ],
    assumed,
    trace: parts.flatMap((x) => x.trace),
    errors: parts.flatMap((x) => x.errors),
  };
}
