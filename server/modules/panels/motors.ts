// A panel's motors: add, change, copy, remove, change many at once, and the overrides on one motor's selection.
import type { Transaction } from 'sequelize';
import type { CurrentUser } from '../../../shared/schemas/auth';
import type { LoadInput } from '../../../shared/schemas/load';
import { LoadSchema } from '../../../shared/schemas/load';
import { flcRefusal } from '../../../shared/calc/flc';
import type { OverrideInput, StoredOverride } from '../../../shared/schemas/override';
import { checkOverride } from '../../../shared/calc/overrides';
import { ConflictError, NotFoundError, ValidationError, zodIssues } from '../../../shared/errors';
import * as repo from './repository';
import { panelSupply, selectAll, selectOne } from '../selection/service';
import { recordPanelActivity } from '../activity/service';
import type { Panel } from '../../db/models/panel';
import type { Job } from '../../db/models/job';
import { changePanel, loadView } from './service';
import { refreshRollup } from './reselection';

function parseAnswers(raw: unknown, prefix = 'body.answers'): LoadInput {
  const r = LoadSchema.safeParse(raw);
  if (!r.success) {
    const issues = zodIssues(r.error.issues).map((i) => ({ ...i, path: i.path ? `${prefix}.${i.path}` : prefix }));
    throw new ValidationError(`The motor's answers have ${issues.length} problem${issues.length === 1 ? '' : 's'}`, issues);
  }
  const refusal = flcRefusal(r.data); // a motor the engine cannot size is refused, not stored with zeros
  if (refusal)
    throw new ValidationError(`${r.data.tag} cannot be sized: ${refusal.message}`, [
      { path: `${prefix}.${refusal.path}`, message: refusal.message },
    ]);
  return raw as LoadInput;
}

async function tagTaken(panelId: number, tag: string, t: Transaction, exceptId?: number) {
  const rows = await repo.loadsOf(panelId, t);
  return rows.some((l) => l.tag.toLowerCase() === tag.toLowerCase() && l.id !== exceptId);
}

export async function addLoad(actor: CurrentUser, panelId: number, answers: unknown, panelVersion: number | null) {
  const input = parseAnswers(answers);
  return changePanel(actor, panelId, panelVersion, `added ${input.tag}`, async (p, t) => {
    if (await tagTaken(p.id, input.tag, t))
      throw new ValidationError(`Tag ${input.tag} is already on this panel`, [
        { path: 'body.answers.tag', message: 'already on this panel' },
      ]);
    const selection = await selectOne(panelSupply(p), input);
    const position = await repo.lastLoadPosition(p.id, t);
    const l = await repo.createLoad(
      {
        organisationId: actor.organisationId,
        panelId: p.id,
        tag: input.tag,
        position: position + 1,
        answers: input,
        selection: selection,
        overrides: [],
      },
      t,
    );
    await refreshRollup(p, t);
    await recordPanelActivity(
      actor,
      p,
      { entity: 'load', entityId: l.id, action: 'added', summary: `Added motor ${input.tag} to ${p.name}` },
      t,
    );
    return loadView(l);
  });
}

export async function addLoads(actor: CurrentUser, answersList: LoadInput[], t: Transaction, p: Panel & { job: Job }) {
  const existing = await repo.loadsOf(p.id, t);
  const tags = new Set(existing.map((l) => l.tag.toLowerCase()));
  let position = existing.reduce((m, l) => Math.max(m, l.position), 0);
  const out = await selectAll(panelSupply(p), answersList);
  const rows = answersList.map((a, i) => {
    if (tags.has(a.tag.toLowerCase()))
      throw new ValidationError(`Tag ${a.tag} is already on this panel`, [{ path: `rows[${i}].tag`, message: 'already on this panel' }]);
    tags.add(a.tag.toLowerCase());
    return {
      organisationId: actor.organisationId,
      panelId: p.id,
      tag: a.tag,
      position: ++position,
      answers: a,
      selection: out!.results[i],
      overrides: [],
    };
  });
  await repo.saveLoads(rows, t);
  await refreshRollup(p, t);
  return rows.length;
}

async function requireLoad(actor: CurrentUser, loadId: number) {
  const l = await repo.findLoad(actor.organisationId, loadId);
  if (!l) throw new NotFoundError('Motor');
  return l;
}

export async function updateLoad(actor: CurrentUser, loadId: number, answers: unknown, version: number) {
  const input = parseAnswers(answers);
  const found = await requireLoad(actor, loadId);
  return changePanel(actor, found.panelId, null, `changed ${input.tag}`, async (p, t) => {
    const l = (await repo.findLoad(actor.organisationId, loadId, t))!;
    if (l.version !== version)
      throw new ConflictError(
        `Someone else changed motor ${l.tag} since you opened it: reload to see their change, then apply yours again`,
      );
    if (input.tag !== l.tag && (await tagTaken(p.id, input.tag, t, l.id)))
      throw new ValidationError(`Tag ${input.tag} is already on this panel`, [
        { path: 'body.answers.tag', message: 'already on this panel' },
      ]);
    const selection = await selectOne(panelSupply(p), input);
    const diff: Record<string, unknown> = {};
    for (const k of new Set([...Object.keys(l.answers), ...Object.keys(input)])) {
      const a = JSON.stringify((l.answers as Record<string, unknown>)[k]);
      const b = JSON.stringify((input as Record<string, unknown>)[k]);
      if (a !== b) diff[k] = { from: (l.answers as Record<string, unknown>)[k] ?? null, to: (input as Record<string, unknown>)[k] ?? null };
    }
    const count = await repo.updateLoad(l.id, { tag: input.tag, answers: input, selection: selection, version: version + 1 }, t, version);
    if (count === 0) throw new ConflictError(`Someone else changed motor ${l.tag}: reload and apply your change again`);
    await refreshRollup(p, t);
    await recordPanelActivity(
      actor,
      p,
      {
        entity: 'load',
        entityId: l.id,
        action: 'changed',
        summary: `Changed motor ${input.tag}: ${Object.keys(diff).join(', ') || 'no answers'}`,
        diff,
      },
      t,
    );
    return loadView((await repo.findLoad(actor.organisationId, loadId, t))!);
  });
}

export async function copyLoad(actor: CurrentUser, loadId: number) {
  const l = await requireLoad(actor, loadId);
  const siblings = await repo.loadsOf(l.panelId);
  const tags = new Set(siblings.map((s) => s.tag.toLowerCase()));
  let n = 2;
  let tag = `${l.tag}-${n}`;
  while (tags.has(tag.toLowerCase())) tag = `${l.tag}-${++n}`;
  return addLoad(actor, l.panelId, { ...l.answers, tag: tag.slice(0, 40) }, null);
}

export async function deleteLoad(actor: CurrentUser, loadId: number) {
  const l = await requireLoad(actor, loadId);
  await changePanel(actor, l.panelId, null, `removed ${l.tag}`, async (p, t) => {
    await repo.deleteLoad(l.id, t);
    await refreshRollup(p, t);
    await recordPanelActivity(
      actor,
      p,
      {
        entity: 'load',
        entityId: l.id,
        action: 'removed',
        summary: `Removed motor ${l.tag} from ${p.name}`,
      },
      t,
    );
  });
}

export async function bulkEdit(
  actor: CurrentUser,
  panelId: number,
  loadIds: number[],
  changes: Record<string, unknown>,
  panelVersion: number,
) {
  return changePanel(actor, panelId, panelVersion, 'bulk edit', async (p, t) => {
    const loads = (await repo.loadsOf(p.id, t)).filter((l) => loadIds.includes(l.id));
    if (loads.length !== loadIds.length) throw new NotFoundError('One of the motors');
    const inputs = loads.map((l, i) => parseAnswers({ ...l.answers, ...changes }, `loads[${i}]`));
    const out = await selectAll(panelSupply(p), inputs);
    // one statement for all the motors
    await repo.saveLoads(
      loads.map((l, i) => ({ ...l.get({ plain: true }), answers: inputs[i], selection: out!.results[i], version: l.version + 1 })),
      t,
      ['answers', 'selection', 'version', 'updatedAt'],
    );
    await refreshRollup(p, t);
    await recordPanelActivity(
      actor,
      p,
      {
        entity: 'panel',
        entityId: p.id,
        action: 'bulk-edit',
        summary: `Changed ${Object.keys(changes).join(', ')} on ${loads.length} motors`,
        diff: changes,
      },
      t,
    );
    return { updated: loads.length };
  });
}

export async function setOverrides(actor: CurrentUser, loadId: number, overrides: OverrideInput[], version: number) {
  const found = await requireLoad(actor, loadId);
  return changePanel(actor, found.panelId, null, `overrides on ${found.tag}`, async (p, t) => {
    const l = (await repo.findLoad(actor.organisationId, loadId, t))!;
    if (l.version !== version) throw new ConflictError(`Someone else changed motor ${l.tag}: reload and apply your change again`);
    const sel = l.selection;
    if (!sel) throw new ValidationError('This motor has no selection to override');
    const fields = new Set<string>();
    const previous = new Map((l.overrides ?? []).map((o) => [o.field, o]));
    const stored: StoredOverride[] = overrides.map((o, i) => {
      if (fields.has(o.field))
        throw new ValidationError(`${o.field} is overridden twice`, [{ path: `body.overrides[${i}].field`, message: 'duplicate' }]);
      fields.add(o.field);
      const warnings = checkOverride(sel, o, i);
      const [a, b] = o.field.split('.');
      const card: unknown = Reflect.get(sel, a!);
      const was: unknown = card && typeof card === 'object' ? (Reflect.get(card, b!) ?? null) : null;
      const prev = previous.get(o.field);
      const same = prev && prev.value === o.value && prev.justification === o.justification;
      return { ...o, was, warnings, by: same ? prev.by : actor.name, at: same ? prev.at : new Date().toISOString() };
    });
    await repo.updateLoad(l.id, { overrides: stored, version: version + 1 }, t);
    await recordPanelActivity(
      actor,
      p,
      {
        entity: 'load',
        entityId: l.id,
        action: 'override',
        summary: `Overrides on ${l.tag}: ${stored.map((o) => `${o.field} = ${o.value}`).join('; ') || 'none'}`,
        diff: { overrides: stored },
      },
      t,
    );
    return loadView((await repo.findLoad(actor.organisationId, loadId, t))!);
  });
}
