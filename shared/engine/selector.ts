// The selection runner. createSelector validates every rule file (a malformed one throws
// RuleFileError naming the file), builds the json-rules-engine Engine once, and returns
// selectLoad / selectPanel. Pure TypeScript: no file access, so it runs in the browser too.
//
// Per load: answers -> FLC (shared/calc/flc) -> facts -> rules (decisions by priority, see
// decisions.ts) -> sizing (shared/calc) -> LoadSelection with its trace. Per panel: the loads in
// input order, then the feeder roll-up (430.24, 430.62(A)).

import { Engine, type RuleResult, type TopLevelCondition } from 'json-rules-engine';
import { DomainError, ValidationError, zodIssues } from '../errors';
import { branchConductor, motorLeadConductors } from '../calc/conductor';
import { motorVoltageDrop, type VoltageDropResult } from '../calc/voltage-drop';
import { motorDisconnect } from '../calc/disconnect';
import { softStarterMinAmps, vfdMinOutputAmps } from '../calc/drives';
import { feederRollup, type FeederBranch } from '../calc/feeder';
import { fullLoadCurrent, WATTS_PER_HP, type FlcResult } from '../calc/flc';
import { lockedRotorCurrent } from '../calc/locked-rotor';
import { nemaStarterSize } from '../calc/nema-starter-size';
import { overloadMaxSetting, overloadRelay } from '../calc/overload';
import { unbalanceDerating } from '../standards/nema-mg1-voltage-unbalance';
import { branchProtection, motorKind, partWindingProtection } from '../calc/scpd';
import { synchronousRpm } from '../calc/synchronous-speed';
import { LoadSchema, SelectionInputSchema, SupplySchema, type Load, type LoadInput, type SelectionInput, type Supply, type SupplyInput } from '../schemas/load';
import type { AssumedInput, LoadSelection, PerWindingScpd, SelectionOutput, StarterType, SupplyKind, TraceEntry, UnbalanceResult } from '../schemas/selection';
import { DEFAULT_CODE_EDITION, nec, type CodeEdition } from '../standards/code-edition';
import { enclosureType } from '../standards/nema-250-enclosure-types';
import { nominalSystemVolts } from '../standards/nominal-system-voltages';
import { type DecisionKey, type Decisions } from './decisions';
import { buildFacts, type Facts } from './facts';
import { validateRuleFiles, type RuleFile } from './rule-file';

export interface RuleFileInput {
  file: string;
  content: unknown;
}

export interface SelectorOptions {
  codeEdition?: CodeEdition;
}

export interface Selector {
  readonly codeEdition: CodeEdition;
  readonly ruleCount: number;
  selectLoad(load: LoadInput, supply: SupplyInput): Promise<LoadSelection>;
  selectPanel(input: SelectionInput): Promise<SelectionOutput>;
  /** The panel roll-up (430.24, 430.62(A)) from selections already made, without running the rules again. */
  panelRollup(supply: SupplyInput, loads: ReadonlyArray<LoadInput>, results: ReadonlyArray<LoadSelection>): SelectionOutput['panel'];
}

/** Decisions every load needs; a rule set that leaves one undecided reports it as an error on the load. */
const REQUIRED: Record<'ac' | 'dc', DecisionKey[]> = {
  ac: ['starter.type', 'starter.nemaDuty', 'starter.iecCategory', 'overload.tripClass', 'enclosure.nemaType'],
  dc: ['starter.type', 'overload.tripClass', 'enclosure.nemaType'],
};
const FALLBACK: Decisions = {
  'starter.type': 'FVNR',
  'starter.nemaDuty': 'normal',
  'starter.iecCategory': 'AC-3',
  'overload.tripClass': 10,
  'enclosure.nemaType': '12',
};
const CONTACTOR_STARTERS: readonly StarterType[] = ['FVNR', 'FVR', 'two-speed'];
const AC_STARTERS: readonly StarterType[] = ['FVNR', 'FVR', 'RVSS', 'VFD', 'wye-delta', 'part-winding', 'two-speed'];

const round2 = (x: number) => Math.round(x * 100) / 100;

function formatValue(v: unknown): string {
  return typeof v === 'string' ? v : JSON.stringify(v);
}


function parseOrThrow<T>(schema: { safeParse(v: unknown): { success: true; data: T } | { success: false; error: { issues: ReadonlyArray<{ path: ReadonlyArray<PropertyKey>; message: string }> } } }, value: unknown, prefix: string): T {
  const r = schema.safeParse(value);
  if (r.success) return r.data;
  const issues = zodIssues(r.error.issues).map((i) => ({ ...i, path: prefix ? (i.path ? `${prefix}.${i.path}` : prefix) : i.path }));
  throw new ValidationError('The selection input is not valid', issues);
}

const SUPPLY_KINDS: readonly SupplyKind[] = ['ac3', 'ac1', 'dc'];

/** False only where the rule's top-level "all" holds a supply condition that this kind fails. */
function mayApplyTo(rule: RuleFile, kind: SupplyKind): boolean {
  const all = (rule.conditions as { all?: unknown }).all;
  if (!Array.isArray(all)) return true;
  for (const c of all as Array<Record<string, unknown>>) {
    if (c?.fact !== 'supply') continue;
    const v = c.value;
    if (c.operator === 'equal' && typeof v === 'string' && v !== kind) return false;
    if (c.operator === 'notEqual' && v === kind) return false;
    if (c.operator === 'in' && Array.isArray(v) && !v.includes(kind)) return false;
    if (c.operator === 'notIn' && Array.isArray(v) && v.includes(kind)) return false;
  }
  return true;
}

export function createSelector(ruleFiles: ReadonlyArray<RuleFileInput>, options: SelectorOptions = {}): Selector {
  const edition = options.codeEdition ?? DEFAULT_CODE_EDITION;
  const rules = validateRuleFiles(ruleFiles);
  const byId = new Map<string, RuleFile>(rules.map((r) => [r.id, r]));
  // One engine per supply kind, holding only the rules whose top-level "all" does not exclude that
  // kind (a static reading of the rule's own supply condition: same outcome, fewer evaluations).
  // Every rule goes in at one engine priority so the engine evaluates them in a single pass; the
  // rule file's priority decides conflicts in the runner below (see decisions.ts).
  const engines = new Map<SupplyKind, Engine>();
  for (const kind of SUPPLY_KINDS) {
    const engine = new Engine([], { allowUndefinedFacts: false, allowUndefinedConditions: false, replaceFactsInEventParams: false });
    for (const r of rules) {
      if (!mayApplyTo(r, kind)) continue;
      engine.addRule({ name: r.id, priority: 1, conditions: r.conditions as unknown as TopLevelCondition, event: r.event });
    }
    engines.set(kind, engine);
  }
  const sub = (text: string) => text.replace(/\{edition\}/g, edition);

  // json-rules-engine keeps one run status per Engine: runs are chained, never concurrent.
  let queue: Promise<unknown> = Promise.resolve();
  const runRules = (facts: Facts): Promise<RuleResult[]> => {
    const engine = engines.get(facts.supply) as Engine;
    const next = queue.then(() => engine.run(facts)).then((r) => r.results);
    queue = next.catch(() => undefined);
    return next;
  };

  async function selectParsed(load: Load, supply: Supply, raw: Record<string, unknown> | null): Promise<LoadSelection> {
    const errors: string[] = [];
    const cautions: string[] = [];
    const assumed: AssumedInput[] = [];
    const trace: TraceEntry[] = [];
    const ac = load.supply !== 'dc';
    const phases: 1 | 3 = load.supply === 'ac3' ? 3 : 1;

    /** runs a sizing step; a value outside a table becomes an error on this load, not a crash */
    function step<T>(what: string, fn: () => T): T | null {
      try {
        return fn();
      } catch (e) {
        if (e instanceof DomainError) {
          errors.push(`${what}: ${e.message}`);
          return null;
        }
        throw e;
      }
    }

    // 1. full-load current (430.6(A)(1))
    const flc: FlcResult | null = step('full-load current', () => fullLoadCurrent(load, edition));
    const hp = flc?.hp ?? round2(load.hp ?? ((load.kw ?? 0) * 1000) / WATTS_PER_HP);
    if (flc) {
      assumed.push(...flc.assumed);
      cautions.push(...flc.cautions);
      trace.push({ ruleId: 'sizing.flc', decision: `flcAmps = ${flc.flcAmps}`, reason: `table full-load current (${flc.source}) sizes conductors, protection and disconnect`, basis: flc.basis });
    }
    const flaAmps = load.fla ?? flc?.flcAmps ?? null;
    if (load.fla === undefined && flc) {
      assumed.push({ field: 'fla', assumed: `${flc.flcAmps} A (table FLC)`, note: 'no nameplate FLA: the overload setting rests on the table current; set it from the nameplate (430.6(A)(2))' });
    }
    if (raw && raw.serviceFactor === undefined && load.tempRiseC === undefined) {
      assumed.push({ field: 'serviceFactor', assumed: '1.0', note: 'not given: overload limit 115 % of FLA (430.32(A)(1)), the lower setting' });
    }
    if (load.environment === undefined) {
      assumed.push({ field: 'environment', assumed: 'indoor-dusty', note: 'not given: NEMA Type 12, the usual industrial control panel enclosure' });
    }
    if (ac && load.codeLetter === undefined) {
      assumed.push({ field: 'codeLetter', assumed: 'none', note: 'no code letter: locked-rotor current not computed (Table 430.7(B))' });
    }
    if (load.supply === 'dc' && load.dcField === undefined) {
      assumed.push({ field: 'dcField', assumed: 'shunt', note: 'not given: shunt field assumed, so field-loss protection is included' });
    }
    if (load.speedControl === 'variable' && load.torque === undefined) {
      assumed.push({ field: 'torque', assumed: 'constant', note: 'not given: constant torque assumed (heavy-duty drive rating)' });
    }
    if (load.supply === 'ac3' && load.speedControl === 'variable' && load.cableLengthFt === undefined) {
      assumed.push({ field: 'cableLengthFt', assumed: 'short (not given)', note: 'output filter need for long motor leads not evaluated' });
    }

    // 2. rules
    const facts = buildFacts(load, supply, { hp, flcAmps: flc?.flcAmps ?? null, flaAmps });
    const results = await runRules(facts);
    const fired = results
      .map((r) => byId.get(String(r.name)))
      .filter((r): r is RuleFile => r !== undefined)
      .sort((a, b) => b.priority - a.priority || a.id.localeCompare(b.id));
    const decisions: Decisions = {};
    const decidedBy = new Map<DecisionKey, RuleFile>();
    for (const rule of fired) {
      const p = rule.event.params;
      const overridden: string[] = [];
      const setText: string[] = [];
      for (const [k, v] of Object.entries(p.set ?? {})) {
        const key = k as DecisionKey;
        setText.push(`${key} = ${formatValue(v)}`);
        const winner = decidedBy.get(key);
        if (!winner) {
          (decisions as Record<string, unknown>)[key] = v;
          decidedBy.set(key, rule);
        } else if ((decisions as Record<string, unknown>)[key] !== v) {
          overridden.push(`${key} kept ${formatValue((decisions as Record<string, unknown>)[key])} from ${winner.id}`);
          if (winner.priority === rule.priority) {
            errors.push(`rules ${winner.id} and ${rule.id} set ${key} differently at the same priority ${rule.priority}`);
          }
        }
      }
      let decision = p.decision;
      if (setText.length) decision += `: ${setText.join(', ')}`;
      if (overridden.length) decision += ` (overridden: ${overridden.join('; ')})`;
      trace.push({ ruleId: rule.id, decision, reason: sub(p.reason), basis: sub(p.basis) });
      if (p.caution) cautions.push(sub(p.caution));
      if (p.error) errors.push(sub(p.error));
    }
    for (const key of REQUIRED[ac ? 'ac' : 'dc']) {
      if (decisions[key] === undefined) {
        errors.push(`no rule decided ${key}`);
        (decisions as Record<string, unknown>)[key] = FALLBACK[key];
      }
    }
    const starterType = decisions['starter.type'] as StarterType;
    if (ac !== AC_STARTERS.includes(starterType)) errors.push(`starter type ${starterType} does not suit a ${load.supply} motor`);
    if (starterType === 'wye-delta' && !((load.leads === 6 || load.leads === 12) && load.connection === 'delta')) {
      errors.push('wye-delta starting needs a six- or twelve-lead motor wound to run in delta');
    }
    const ruleBasis = (key: DecisionKey) => {
      const r = decidedBy.get(key);
      return r ? sub(r.event.params.basis) : 'fallback (no rule)';
    };

    // 3. sizing
    const flcAmps = flc?.flcAmps ?? 0;
    const fla = flaAmps ?? 0;
    const haveFlc = flc !== null;

    let nemaSize: string | null = null;
    let starterBasis = ruleBasis('starter.type');
    const contactorAmps = Math.max(flcAmps, fla);
    if (haveFlc && ac && CONTACTOR_STARTERS.includes(starterType)) {
      let n: ReturnType<typeof nemaStarterSize> | null = null;
      try {
        n = nemaStarterSize({ hp, phases, volts: load.volts, duty: decisions['starter.nemaDuty'] ?? 'normal', amps: contactorAmps }, edition);
      } catch (e) {
        if (!(e instanceof DomainError)) throw e;
        cautions.push(`No NEMA size: ${e.message}; select the contactor by its IEC rated operational current.`);
      }
      if (n) {
        nemaSize = n.size;
        starterBasis += `; ${n.basis}`;
        trace.push({ ruleId: 'sizing.nema-size', decision: `starter.nemaSize = ${n.size}`, reason: `${n.ratedHp} hp rated at this voltage and duty, ${n.continuousAmps} A continuous`, basis: n.basis });
      }
    }
    let iecCategory: 'AC-3' | 'AC-4' | null = null;
    let iecAmps: number | null = null;
    if (ac && haveFlc && (CONTACTOR_STARTERS.includes(starterType) || starterType === 'wye-delta' || starterType === 'part-winding')) {
      iecCategory = decisions['starter.iecCategory'] ?? 'AC-3';
      const share = starterType === 'wye-delta' ? 1 / Math.sqrt(3) : starterType === 'part-winding' ? 0.5 : 1;
      iecAmps = round2(contactorAmps * share);
      trace.push({
        ruleId: 'sizing.iec-contactor',
        decision: `starter.iecAmps = ${iecAmps} (${iecCategory})`,
        reason: share === 1 ? 'rated operational current in the category at least the motor current' : `each contactor carries ${share === 0.5 ? 'half' : '1/√3'} of the motor current`,
        basis: 'IEC 60947-4-1 utilisation categories' + (share === 1 ? '' : ' (common practice)'),
      });
    }

    const ol = step('overload', () => overloadMaxSetting({ flaAmps: fla, serviceFactor: load.serviceFactor, tempRiseC: load.tempRiseC }, edition));
    if (ol && haveFlc) {
      trace.push({ ruleId: 'sizing.overload', decision: `overload.maxSettingAmps = ${ol.maxSettingAmps} (${ol.maxPercent} % of ${fla} A)`, reason: ol.why, basis: ol.basis });
    }
    const relay = ol && haveFlc ? overloadRelay({ flaAmps: fla, maxSettingAmps: ol.maxSettingAmps, starterType }, edition) : null;
    if (relay && relay.share !== 1) {
      trace.push({ ruleId: 'sizing.overload-relay', decision: `overload.relay: ${relay.count} × set ${relay.settingAmps} A, ≤ ${relay.maxAmps} A`, reason: relay.note ?? '', basis: relay.basis });
    }

    let scpd = haveFlc
      ? step('branch protection', () => branchProtection({ flcAmps, type: load.scpdType, motor: motorKind(load), override: load.scpdOverride }, edition))
      : null;
    if (!scpd && haveFlc && load.scpdOverride) {
      scpd = step('branch protection', () => branchProtection({ flcAmps, type: load.scpdType, motor: motorKind(load) }, edition));
    }
    // Part-winding (NEC 430.4): the selection keeps one device for both windings under the exception
    // (it must let the motor start; time-delay fuses then at most 150 % of FLC) and states the
    // alternative of a device on each half-winding at one-half the 430.52 value.
    let perWinding: PerWindingScpd | null = null;
    if (scpd && starterType === 'part-winding') {
      const single = scpd;
      const pw = step('branch protection per half-winding', () => partWindingProtection(single, { flcAmps, motor: motorKind(load) }, edition));
      if (pw) {
        scpd = pw.single;
        perWinding = pw.perWinding;
        trace.push({
          ruleId: 'sizing.scpd-per-winding',
          decision: `scpd.perWinding = 2 × ${perWinding.ratingAmps} A (max ${perWinding.maxPercent} % = ${perWinding.computedMaxAmps} A each)`,
          reason: 'a part-winding motor may instead have a device on each half-winding connection, each at one-half the 430.52 value',
          basis: perWinding.basis,
        });
      }
    }
    if (scpd) {
      trace.push({
        ruleId: 'sizing.scpd',
        decision: `scpd.ratingAmps = ${scpd.ratingAmps} (${scpd.type}, max ${scpd.maxPercent} % = ${scpd.computedMaxAmps} A)`,
        reason: scpd.exception === 'exception-1' ? 'the computed maximum is not a standard rating: next higher standard rating' : scpd.exception === 'exception-2' ? `explicit override: ${load.scpdOverride?.reason}` : 'at the Table 430.52 maximum',
        basis: scpd.basis,
      });
      if (scpd.exception === 'exception-2') cautions.push(`Branch protection raised under ${scpd.basis}: only where the motor will not start at the normal limit; the engineer must confirm.`);
    }

    const cond = haveFlc
      ? step('branch conductors', () =>
          branchConductor({ flcAmps, material: load.conductor.material, tempRatingC: load.conductor.tempRatingC, ambientC: supply.ambientC, driveInputAmps: starterType === 'VFD' ? load.driveInputAmps : undefined }, edition),
        )
      : null;
    if (cond) {
      cautions.push(...cond.cautions);
      trace.push({ ruleId: 'sizing.conductor', decision: `conductor.size = ${cond.size} (${cond.ampacity} A >= ${cond.minAmpacity} A)`, reason: 'smallest conductor whose allowable ampacity covers the minimum', basis: cond.basis });
    }
    const leads = cond
      ? step('motor-lead conductors', () =>
          motorLeadConductors({ flcAmps, starterType, material: load.conductor.material, tempRatingC: load.conductor.tempRatingC, ambientC: supply.ambientC }, edition),
        )
      : null;
    if (leads) {
      cautions.push(...leads.cautions);
      trace.push({
        ruleId: 'sizing.motor-leads',
        decision: `conductor.motorLeads = ${leads.count} × ${leads.size} (${leads.ampacity} A >= ${leads.minAmpacity} A)`,
        reason: `between the controller and the motor each lead carries ${leads.share === 0.5 ? 'half' : 'about 58 % (1/√3)'} of the motor current`,
        basis: leads.basis,
      });
    }
    // running voltage drop over the cable, on the conductors that make the run to the motor
    let voltageDrop: VoltageDropResult | null = null;
    if (cond && load.cableLengthFt !== undefined && load.cableLengthFt > 0) {
      const onLeads = leads !== null;
      voltageDrop = step('voltage drop', () =>
        motorVoltageDrop(
          {
            amps: fla,
            ratedVolts: load.volts,
            threePhase: load.supply === 'ac3',
            lengthFt: load.cableLengthFt!,
            conductor: onLeads ? leads!.size : cond.size,
            material: load.conductor.material,
            circuit: onLeads ? (starterType === 'wye-delta' ? 'delta-leads' : 'half-windings') : 'line',
          },
          edition,
        ),
      );
      if (voltageDrop) {
        trace.push({
          ruleId: 'sizing.voltage-drop',
          decision: `conductor.voltageDrop = ${voltageDrop.volts} V (${voltageDrop.percent} %) over ${voltageDrop.lengthFt} ft`,
          reason: `${fla} A at full load on ${onLeads ? `the motor leads (${leads!.size})` : cond.size}`,
          basis: voltageDrop.basis,
        });
        if (voltageDrop.percent > voltageDrop.limitPercent) {
          cautions.push(
            `Running voltage drop ${voltageDrop.percent} % over ${voltageDrop.lengthFt} ft is above ${voltageDrop.limitPercent} % (common practice)${voltageDrop.sizeWithinLimit ? `: ${voltageDrop.sizeWithinLimit} keeps it within` : ''}; check the drop at starting too.`,
          );
        }
      }
    }
    if (starterType === 'VFD' && load.driveInputAmps === undefined) {
      cautions.push('Drive input conductors follow 430.122(A): 125 % of the drive rated input current — recheck once the drive is chosen.');
    }

    const disc = haveFlc ? step('disconnect', () => motorDisconnect({ flcAmps, hp: round2(hp), driveInputAmps: starterType === 'VFD' ? load.driveInputAmps : undefined }, edition)) : null;
    if (disc) trace.push({ ruleId: 'sizing.disconnect', decision: `disconnect.minAmps = ${disc.minAmps}, minHp = ${disc.minHp}`, reason: '115 % of the table FLC, horsepower rated', basis: disc.basis });

    // The site's voltage unbalance: a motor on the line is derated (NEMA MG 1 14.35); behind a drive the
    // rectifier takes it and the motor sees balanced output (common practice).
    let unbalance: UnbalanceResult | null = null;
    const unbalancePercent = supply.voltageUnbalancePercent;
    if (load.supply === 'ac3' && unbalancePercent > 0) {
      if (starterType === 'VFD') {
        if (unbalancePercent > 1) cautions.push(`Voltage unbalance ${unbalancePercent} % at the site: the drive's input takes it (the motor sees balanced output); check the drive's limit for input unbalance and fit a line reactor where its instructions call for one (common practice).`);
      } else {
        const u = unbalanceDerating(unbalancePercent);
        unbalance = { percent: u.percent, deratingFactor: u.factor, deratedHp: u.factor !== null && hp > 0 ? round2(hp * u.factor) : null, basis: u.basis };
        trace.push({
          ruleId: 'sizing.voltage-unbalance',
          decision: u.factor === null ? 'unbalance.deratingFactor = none (above 5 %)' : `unbalance.deratingFactor = ${u.factor}`,
          reason: `${u.percent} % voltage unbalance at the site`,
          basis: u.basis,
        });
        if (u.factor === null) {
          cautions.push(`Voltage unbalance ${u.percent} % at the site: operating a motor above 5 % unbalance is not recommended (NEMA MG 1 14.35); correct the supply first.`);
        } else if (u.factor < 1) {
          cautions.push(`Voltage unbalance ${u.percent} % at the site: the motor can deliver about ${u.factor} × its rating${unbalance.deratedHp !== null ? ` = ${unbalance.deratedHp} hp` : ''} (NEMA MG 1 14.35); check the driven load against that.`);
        }
      }
    }

    let lockedRotorAmps: LoadSelection['lockedRotorAmps'] = null;
    if (ac && load.codeLetter !== undefined) {
      lockedRotorAmps = step('locked-rotor current', () => lockedRotorCurrent({ codeLetter: load.codeLetter as string, hp, volts: load.volts, phases }, edition));
      if (lockedRotorAmps) trace.push({ ruleId: 'sizing.locked-rotor', decision: `lockedRotorAmps = ${lockedRotorAmps.min}–${lockedRotorAmps.max} A`, reason: 'code letter kVA/hp at rated voltage', basis: lockedRotorAmps.basis });
    }
    const syncRpm = ac && load.poles !== undefined ? synchronousRpm(load.hz, load.poles) : null;

    let vfd: LoadSelection['vfd'] = null;
    if (starterType === 'VFD') {
      const duty = decisions['vfd.duty'];
      if (!duty) errors.push('no rule decided vfd.duty');
      const v = vfdMinOutputAmps(fla, duty ?? 'heavy', edition);
      vfd = {
        duty: duty ?? 'heavy',
        minOutputAmps: v.minOutputAmps,
        inverterDutyMotor: decisions['vfd.inverterDutyMotor'] ?? false,
        outputFilter: decisions['vfd.outputFilter'] ?? 'none',
        basis: v.basis,
      };
      trace.push({ ruleId: 'sizing.vfd', decision: `vfd.minOutputAmps = ${v.minOutputAmps} (${vfd.duty} duty)`, reason: 'drive output current at its duty rating covers the motor nameplate current', basis: v.basis });
    }
    let softStarter: LoadSelection['softStarter'] = null;
    if (starterType === 'RVSS') {
      const insideDelta = decisions['softStarter.insideDelta'] ?? false;
      const s = softStarterMinAmps(fla, insideDelta);
      softStarter = { minAmps: s.minAmps, insideDelta, bypass: decisions['softStarter.bypass'] ?? true };
      trace.push({ ruleId: 'sizing.soft-starter', decision: `softStarter.minAmps = ${s.minAmps}`, reason: insideDelta ? 'inside-delta connection' : 'in-line connection', basis: s.basis });
    }
    const dc: LoadSelection['dc'] =
      load.supply === 'dc'
        ? { fieldLossProtection: decisions['dc.fieldLossProtection'] ?? false, dynamicBraking: decisions['dc.dynamicBraking'] ?? false, field: load.dcField ?? 'shunt' }
        : null;

    const nemaType = decisions['enclosure.nemaType'] as string;
    const ipCode = step('enclosure', () => enclosureType(nemaType).ipCode) ?? '';

    return {
      tag: load.tag,
      ...(load.description !== undefined ? { description: load.description } : {}),
      supply: load.supply,
      hp: load.hp !== undefined || load.kw !== undefined ? round2(hp) : null,
      volts: load.volts,
      tableVolts: flc?.tableVolts ?? null,
      flcAmps,
      flcSource: flc?.source ?? 'not determined',
      flaAmps: fla,
      lockedRotorAmps,
      synchronousRpm: syncRpm,
      starter: {
        type: starterType,
        nemaSize,
        iecCategory,
        iecAmps,
        reversingContactors: decisions['starter.reversingContactors'] ?? false,
        interlock: decisions['starter.interlock'] ?? false,
        basis: starterBasis,
      },
      overload: {
        maxSettingAmps: haveFlc && ol ? ol.maxSettingAmps : 0,
        maxPercent: ol?.maxPercent ?? 0,
        tripClass: decisions['overload.tripClass'] as 10 | 20 | 30,
        providedByDrive: decisions['overload.providedByDrive'] ?? false,
        basis: `${ol?.basis ?? nec(edition, '430.32(A)(1)')}; trip class: ${ruleBasis('overload.tripClass')}`,
        ...(relay ? { relay } : {}),
      },
      scpd: scpd
        ? { type: scpd.type, maxPercent: scpd.maxPercent, ratingAmps: scpd.ratingAmps, computedMaxAmps: scpd.computedMaxAmps, basis: scpd.basis, ...(perWinding ? { perWinding } : {}) }
        : { type: load.scpdType, maxPercent: 0, ratingAmps: 0, computedMaxAmps: 0, basis: 'not determined' },
      conductor: cond
        ? {
            minAmpacity: cond.minAmpacity,
            size: cond.size,
            material: cond.material,
            tempRatingC: cond.tempRatingC,
            ampacity: cond.ampacity,
            basis: cond.basis,
            ...(leads ? { motorLeads: { count: leads.count, share: leads.share, minAmpacity: leads.minAmpacity, size: leads.size, ampacity: leads.ampacity, basis: leads.basis } } : {}),
            ...(voltageDrop ? { voltageDrop } : {}),
          }
        : { minAmpacity: 0, size: 'not determined', material: load.conductor.material, tempRatingC: load.conductor.tempRatingC, ampacity: 0, basis: 'not determined' },
      disconnect: disc ?? { minAmps: 0, minHp: null, basis: 'not determined' },
      relays: {
        phaseLoss: decisions['relays.phaseLoss'] ?? false,
        phaseReversal: decisions['relays.phaseReversal'] ?? false,
        phaseLossByOverload: decisions['relays.phaseLossByOverload'] ?? false,
      },
      enclosure: { nemaType, ipCode, flagForEngineer: decisions['enclosure.flagForEngineer'] ?? false },
      vfd,
      softStarter,
      dc,
      controlScheme: load.controlScheme,
      unbalance,
      cautions: [
        ...new Set([
          ...cautions,
          ...(load.controlScheme === 'two-wire'
            ? ['Two-wire control restarts the motor by itself when power returns: the engineer confirms an automatic restart is safe for this machine (NFPA 79 7.5, from memory).']
            : []),
        ]),
      ],
      assumed,
      trace,
      errors,
    };
  }

  async function selectLoad(load: LoadInput, supply: SupplyInput): Promise<LoadSelection> {
    const s = parseOrThrow(SupplySchema, supply, 'supply');
    const l = parseOrThrow(LoadSchema, load, '');
    return selectParsed(l, s, load as Record<string, unknown>);
  }

  async function selectPanel(input: SelectionInput): Promise<SelectionOutput> {
    const parsed = parseOrThrow(SelectionInputSchema, input, '');
    const rawLoads = (input as { loads: Array<Record<string, unknown>> }).loads;
    const results: LoadSelection[] = [];
    for (let i = 0; i < parsed.loads.length; i++) {
      results.push(await selectParsed(parsed.loads[i] as Load, parsed.supply, rawLoads[i] ?? null));
    }
    return { results, panel: rollup(parsed.supply, parsed.loads, results), codeEdition: `NEC ${edition}` };
  }

  function rollup(supply: Supply, loads: Load[], results: LoadSelection[]): SelectionOutput['panel'] {
    const notes: string[] = [];
    const errors: string[] = [];
    const branches: FeederBranch[] = [];
    const supplySystem = nominalSystemVolts(supply.volts);
    const feederFamily = supply.feeder.ocpdType === 'inverse-time-breaker' ? 'breaker' : 'fuse';
    results.forEach((r, i) => {
      const load = loads[i] as Load;
      if (r.flcAmps <= 0 || r.scpd.ratingAmps <= 0) {
        errors.push(`${r.tag}: left out of the feeder roll-up (its selection has errors)`);
        return;
      }
      if (load.supply === 'dc') {
        notes.push(`${r.tag}: DC motor left out; add its drive or rectifier rated input current to the feeder`);
        return;
      }
      if (load.supply === 'ac3' && supply.phases === 1) {
        errors.push(`${r.tag}: a three-phase motor cannot be fed from a single-phase supply`);
        return;
      }
      if (nominalSystemVolts(load.volts) === null || nominalSystemVolts(load.volts) !== supplySystem) {
        notes.push(`${r.tag}: rated ${load.volts} V, not on the ${supply.volts} V feeder directly; add its transformer's primary current`);
        return;
      }
      let deviceAmps = r.scpd.ratingAmps;
      if (r.scpd.type === 'instantaneous-trip-breaker') {
        // 430.62(A): an instantaneous-trip branch counts at the Table 430.52 % of the feeder device type
        const p = branchProtection({ flcAmps: r.flcAmps, type: supply.feeder.ocpdType, motor: motorKind(load) }, edition);
        deviceAmps = p.ratingAmps;
        notes.push(`${r.tag}: instantaneous-trip branch counted at ${p.maxPercent} % (${supply.feeder.ocpdType}) = ${p.ratingAmps} A per 430.62(A)`);
      }
      branches.push({ tag: r.tag, flcAmps: r.flcAmps, branchDeviceAmps: deviceAmps });
    });
    const f = feederRollup(
      { branches, material: supply.feeder.material, tempRatingC: supply.feeder.tempRatingC, ambientC: supply.ambientC, ocpdFamily: feederFamily },
      edition,
    );
    return { feeder: f.feeder, totalFlcAmps: f.totalFlcAmps, largestMotorTag: f.largestMotorTag, notes: [...notes, ...f.notes], errors: [...errors, ...f.errors] };
  }

  function panelRollup(supply: SupplyInput, loads: ReadonlyArray<LoadInput>, results: ReadonlyArray<LoadSelection>): SelectionOutput['panel'] {
    const s = parseOrThrow(SupplySchema, supply, 'supply');
    const parsed = loads.map((l, i) => parseOrThrow(LoadSchema, l, `loads[${i}]`));
    return rollup(s, parsed, [...results]);
  }

  return { codeEdition: edition, ruleCount: rules.length, selectLoad, selectPanel, panelRollup };
}
