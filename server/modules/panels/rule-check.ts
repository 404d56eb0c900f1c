// A panel's stored selections against the current rules and tables. A selection is stored when a
// motor is saved; rule files and table modules change with releases of the product, so a draft can
// hold selections the engine would no longer make. The check runs the engine on the stored answers
// and names every decision that would change; "select again" stores the new selections.
import { issueSentence } from '../../../shared/plain-messages';
import { createHash } from 'node:crypto';
import type { CurrentUser } from '../../../shared/schemas/auth';
import { jobSupply } from '../../../shared/schemas/job';
import type { LoadInput } from '../../../shared/schemas/load';
import type { LoadSelection, PanelRollup } from '../../../shared/schemas/selection';
import { motorFeed } from '../../../shared/calc/other-sources';
import type { RuleCheckBody } from '../../../shared/schemas/panel';
import { selectionDifferences } from '../../../shared/calc/selection-diff';
import { recordPanelActivity } from '../activity/service';
import * as repo from './repository';
import { panelSupply, selectAll, selectOne } from '../selection/service';
import { ValidationError } from '../../../shared/errors';
import { changePanel, requirePanel } from './service';
import { reselectPanel } from './reselection';
import type { Load } from '../../db/models/load';

/** Each motor's selection under the current rules (or the reason its stored answers no longer pass them), and the panel roll-up when all pass. */
async function currentSelections(
  job: Parameters<typeof selectAll>[0],
  loads: Load[],
): Promise<{ results: Array<LoadSelection | string>; rollup: PanelRollup | null }> {
  try {
    const out = await selectAll(
      job,
      loads.map((l) => l.answers as LoadInput),
    );
    return { results: out?.results ?? [], rollup: out?.panel ?? null };
  } catch (e) {
    if (!(e instanceof ValidationError)) throw e;
    // one motor's answers fail the current schema: the others are still checked, that one is named
    const results = await Promise.all(
      loads.map((l) =>
        selectOne(job, l.answers as LoadInput).catch((err: unknown) => {
          if (!(err instanceof ValidationError)) throw err;
          return `its answers no longer pass: ${(err.details ?? []).map((d) => issueSentence(d.path, d.message)).join('; ') || err.message}`;
        }),
      ),
    );
    return { results, rollup: null };
  }
}

/** Where a motor at another voltage takes its power in a roll-up, in words (a roll-up stored before the panel carried other sources has neither). */
function feedWords(rollup: PanelRollup | null, tag: string): string {
  const f = motorFeed(rollup, tag);
  if (!f) return 'left out of the feeder';
  return f.source ? `${f.source.tag}, ${f.source.description}` : 'a source outside the panel';
}

async function differencesOf(
  job: Parameters<typeof selectAll>[0],
  loads: Load[],
  storedRollup: PanelRollup | null,
): Promise<RuleCheckBody['changed']> {
  const { results: now, rollup } = await currentSelections(job, loads);
  const changed: RuleCheckBody['changed'] = [];
  loads.forEach((l, i) => {
    const stored = l.selection;
    const current = now[i];
    if (current === undefined) return;
    const differences =
      typeof current === 'string'
        ? [{ field: 'answers', label: 'Answers', from: 'accepted', to: current }]
        : stored
          ? selectionDifferences(stored, current)
          : [{ field: 'selection', label: 'Selection', from: 'none', to: 'made' }];
    // a motor at another voltage: the source the panel roll-up gives it (transformer, DC supply, outside) is a panel decision
    if (rollup && motorFeed(rollup, l.tag)) {
      const from = feedWords(storedRollup, l.tag);
      const to = feedWords(rollup, l.tag);
      if (from !== to) differences.push({ field: 'fedFrom', label: 'Fed from', from, to });
    }
    if (differences.length) changed.push({ loadId: l.id, tag: l.tag, differences });
  });
  return changed;
}

/** "Branch protection (A)" -> "branch protection"; "NEMA size" stays. */
function inSentence(label: string): string {
  const bare = label.replace(/ \([^)]*\)$/, '');
  return /^[A-Z][A-Z]/.test(bare) ? bare : bare.charAt(0).toLowerCase() + bare.slice(1);
}

// The engine's answer depends only on the stored answers, the job's supply and the rule set, which is
// fixed for the life of a process: the result is kept per panel under a digest of what it read
// (about 0.6 ms of engine time per motor saved on every repeated look).
const checked = new Map<number, { digest: string; changed: RuleCheckBody['changed'] }>();
const MAX_CHECKED = 500;

export async function ruleCheck(actor: CurrentUser, panelId: number): Promise<RuleCheckBody> {
  const p = await requirePanel(actor, panelId);
  const loads = await repo.loadsOf(p.id);
  const digest = createHash('sha1')
    .update(
      JSON.stringify([jobSupply(panelSupply(p)), p.job.codeEdition, p.rollup, loads.map((l) => [l.id, l.tag, l.answers, l.selection])]),
    )
    .digest('hex');
  let hit = checked.get(p.id);
  if (!hit || hit.digest !== digest) {
    hit = { digest, changed: await differencesOf(panelSupply(p), loads, (p.rollup ?? null) as PanelRollup | null) };
    checked.delete(p.id);
    checked.set(p.id, hit);
    if (checked.size > MAX_CHECKED) checked.delete(checked.keys().next().value as number);
  }
  return { panelId: p.id, panelVersion: p.version, motorCount: loads.length, changed: hit.changed };
}

/** Runs the rules again for every motor of a draft or returned panel (a signed-off one opens a new draft). */
export async function reselectUnderCurrentRules(actor: CurrentUser, panelId: number, version: number) {
  return changePanel(actor, panelId, version, 'selected again under the current rules', async (p, t) => {
    const loads = await repo.loadsOf(p.id, t);
    const changed = await differencesOf(panelSupply(p), loads, (p.rollup ?? null) as PanelRollup | null);
    await reselectPanel(p, t);
    await recordPanelActivity(
      actor,
      p,
      {
        entity: 'panel',
        entityId: p.id,
        action: 'reselected',
        summary: changed.length
          ? `Selected ${loads.length} motors again under the current rules: ${changed.map((c) => `${c.tag} (${c.differences.map((d) => inSentence(d.label)).join(', ')})`).join('; ')}`
          : `Selected ${loads.length} motors again under the current rules: nothing changed`,
        diff: Object.fromEntries(
          changed.map((c) => [c.tag, Object.fromEntries(c.differences.map((d) => [d.field, { from: d.from, to: d.to }]))]),
        ),
      },
      t,
    );
    return { motorCount: loads.length, changed };
  });
}
