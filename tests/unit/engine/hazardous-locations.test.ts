// Hazardous-location rules: a starter makes and breaks current, so none of their texts may invite a
// builder to downgrade its enclosure. NEC 2023 501.115(B)(1): in Class I, Division 2 an enclosure
// for a device that interrupts current is identified for Class I, Division 1 (explosionproof) unless
// the contacts are hermetically sealed, non-incendive, oil-immersed (or the enclosure purged, NFPA 496);
// 501.115(A) and 502.115(A)/(B) for the other divisions (clause wording from memory).
import { describe, expect, it } from 'vitest';
import { validateRuleFiles, type RuleFile } from '../../../shared/engine/rule-file';
import { motor, ruleFiles, selector, supply480 } from './selector-setup';

const HAZARDOUS = /^class[12]-div[12]$/;

/** every environment value a condition tree compares with */
function environments(node: unknown, out: string[] = []): string[] {
  if (Array.isArray(node)) for (const n of node) environments(n, out);
  else if (node && typeof node === 'object') {
    const o = node as Record<string, unknown>;
    if (o.fact === 'environment') out.push(...([] as unknown[]).concat(o.value).filter((v): v is string => typeof v === 'string'));
    for (const v of Object.values(o)) if (v && typeof v === 'object') environments(v, out);
  }
  return out;
}

const hazardousRules: RuleFile[] = validateRuleFiles(ruleFiles).filter((r) => environments(r.conditions).some((e) => HAZARDOUS.test(e)));

/** wording that lets a general-purpose (or any lesser) enclosure stand in for the starter's */
const PERMISSIVE = [
  /general[- ]purpose/i, // a reason never names it: it is the downgrade the rule must not suggest
  /non-arcing/i, // the starter is not a non-arcing device
  /\b(permit|permits|permitted|allow|allows|allowed|acceptable|may use|may be used)\b[^.;]*(enclosure|Type \d)/i,
];

describe('hazardous-location rules never invite a lesser starter enclosure (NEC 2023 501.115, 502.115)', () => {
  it('finds the four hazardous-location rules of rules/enclosure', () => {
    expect(hazardousRules.map((r) => r.id).sort()).toEqual([
      'enclosure-class1-div1',
      'enclosure-class1-div2',
      'enclosure-class2-div1',
      'enclosure-class2-div2',
    ]);
  });

  it.each(hazardousRules.map((r) => [r.id, r] as const))(
    '%s: reason has no permissive wording, and the engineer is flagged',
    (_id, rule) => {
      const p = rule.event.params;
      for (const re of PERMISSIVE) expect(p.reason, `${rule.id} reason matches ${re}`).not.toMatch(re);
      expect(p.decision).not.toMatch(/general[- ]purpose/i);
      expect(p.set?.['enclosure.flagForEngineer']).toBe(true);
      expect(p.caution).toMatch(/engineer to decide and sign/);
    },
  );

  it('the PERMISSIVE check catches the old Class I, Division 2 wording', () => {
    const old =
      'Class I, Division 2: Type 7 is acceptable, but NEC Article 501 also permits purged, non-incendive or general-purpose enclosures for non-arcing devices — the engineer decides.';
    expect(PERMISSIVE.some((re) => re.test(old))).toBe(true);
  });

  it('Class I, Division 2: the starter is explosionproof unless its contacts are sealed, non-incendive, oil-immersed or purged (NEC 2023 501.115(B)(1))', async () => {
    const r = await selector.selectLoad(motor({ environment: 'class1-div2' }), supply480);
    expect(r.enclosure).toEqual({ nemaType: '7', ipCode: 'none (hazardous location)', flagForEngineer: true });
    const t = r.trace.find((x) => x.ruleId === 'enclosure-class1-div2');
    expect(t?.reason).toMatch(/makes and breaks current/);
    expect(t?.reason).toMatch(/explosionproof/);
    for (const w of ['hermetically sealed', 'non-incendive', 'oil-immersed', 'purged']) expect(t?.reason).toContain(w);
    expect(t?.basis).toBe('NEMA 250 Type 7; NEC 2023 501.115(B)(1)');
  });
});
