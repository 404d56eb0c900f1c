// The shop's catalogue and labour units: list, edit with optimistic versions, import all-or-nothing,
// and the history of every item (from the activity log).
import type { Transaction } from 'sequelize';
import { db } from '../../db/sequelize';
import { activityRows } from '../activity/repository';
import type { CurrentUser } from '../../../shared/schemas/auth';
import {
  CatalogueItemSchema,
  type CatalogueEntry,
  type CatalogueFilter,
  type CatalogueItem,
  type HistoryEntry,
  type ImportSummary,
  type ItemChanges,
  type LabourKey,
  type LabourUnit,
  type LabourUnitEntry,
} from '../../../shared/schemas/catalogue';
import { ConflictError, NotFoundError, ValidationError, zodIssues } from '../../../shared/errors';
import { recordActivity } from '../activity/service';
import * as repo from './repository';
import { toItem, type CatalogueRow } from './repository';
import { parseCatalogueFile, type ImportError } from './spreadsheet';

const entry = (r: CatalogueRow): CatalogueEntry => ({ ...toItem(r), id: r.id, version: r.version, updatedAt: r.updatedAt.toISOString() });

export async function listItems(actor: CurrentUser, f: CatalogueFilter): Promise<CatalogueEntry[]> {
  const active = f.active === 'true' || f.active === undefined ? true : f.active === 'false' ? false : null;
  const q = f.q?.trim();
  const like = q ? `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%` : null;
  const rows = await repo.searchItems(actor.organisationId, { category: f.category, active, like });
  return rows.map(entry);
}

async function requireItem(actor: CurrentUser, id: number, t?: Transaction, lock = false) {
  const r = await repo.findItem(actor.organisationId, id, t, lock);
  if (!r) throw new NotFoundError('Catalogue item');
  return r;
}

export async function getItem(actor: CurrentUser, id: number): Promise<CatalogueEntry> {
  return entry(await requireItem(actor, id));
}

function validateItem(raw: unknown): CatalogueItem {
  const r = CatalogueItemSchema.safeParse(raw);
  if (!r.success) {
    const issues = zodIssues(r.error.issues).map((i) => ({ ...i, path: i.path ? `body.${i.path}` : 'body' }));
    throw new ValidationError(
      `The item has ${issues.length} problem${issues.length === 1 ? '' : 's'}: ${issues.map((i) => `${i.path} ${i.message}`).join('; ')}`,
      issues,
    );
  }
  return r.data;
}

/** JSON with object keys sorted, so that two equal values compare equal whatever their key order. */
function canonical(v: unknown): string {
  return JSON.stringify(v, (_k, x: unknown) =>
    x && typeof x === 'object' && !Array.isArray(x)
      ? Object.fromEntries(Object.entries(x as Record<string, unknown>).sort(([a], [b]) => a.localeCompare(b)))
      : x,
  );
}

/** Fields that differ between two items: { field: [before, after] } (ratings compared as a whole). */
export function itemDiff(before: CatalogueItem | null, after: CatalogueItem): Record<string, [unknown, unknown]> {
  const out: Record<string, [unknown, unknown]> = {};
  // every field either side holds: a dimension the new version leaves out is a change too
  const keys = new Set([...Object.keys(before ?? {}), ...Object.keys(after)]) as Set<keyof CatalogueItem>;
  for (const k of keys) {
    const a = before ? before[k] : null;
    const b = after[k];
    if (canonical(a ?? null) !== canonical(b ?? null)) out[k] = [a ?? null, b];
  }
  return out;
}

/** `item` is already validated by CatalogueItemSchema (the route's body schema). */
export async function createItem(actor: CurrentUser, item: CatalogueItem): Promise<CatalogueEntry> {
  return db().transaction(async (t) => {
    const exists = await repo.findItemByCode(actor.organisationId, item.code, t);
    if (exists)
      throw new ConflictError(`The catalogue already has an item ${item.code}`, [
        { path: 'body.code', message: 'already in the catalogue' },
      ]);
    const r = await repo.insertItem(actor.organisationId, item, t);
    await recordActivity(
      actor,
      {
        entity: 'catalogue_item',
        entityId: r.id,
        action: 'created',
        summary: `Added ${item.code} to the catalogue`,
        diff: itemDiff(null, item),
      },
      t,
    );
    return entry(r);
  });
}

export async function updateItem(actor: CurrentUser, id: number, changes: ItemChanges, version: number): Promise<CatalogueEntry> {
  return db().transaction(async (t) => {
    const r = await requireItem(actor, id, t, true);
    if (r.version !== version) {
      throw new ConflictError(`Someone else changed ${r.code} since you opened it: reload to see their change, then apply yours again`, {
        currentVersion: r.version,
      });
    }
    const before = toItem(r);
    const after = validateItem({ ...before, ...changes, code: before.code });
    const diff = itemDiff(before, after);
    if (Object.keys(diff).length === 0) return entry(r);
    const count = await repo.writeItem(actor.organisationId, id, after, version + 1, t, version);
    if (count !== 1) throw new ConflictError(`Someone else changed ${r.code} since you opened it`);
    const what = Object.keys(diff).join(', ');
    const action = 'active' in diff && Object.keys(diff).length === 1 ? (after.active ? 'reactivated' : 'deactivated') : 'updated';
    await recordActivity(
      actor,
      {
        entity: 'catalogue_item',
        entityId: id,
        action,
        summary:
          action === 'updated' ? `Changed ${r.code}: ${what}` : `${action === 'reactivated' ? 'Reactivated' : 'Deactivated'} ${r.code}`,
        diff,
      },
      t,
    );
    return entry((await repo.itemById(id, t))!);
  });
}

export function setActive(actor: CurrentUser, id: number, active: boolean, version: number) {
  return updateItem(actor, id, { active }, version);
}

export async function itemHistory(actor: CurrentUser, id: number): Promise<HistoryEntry[]> {
  await requireItem(actor, id);
  const rows = await activityRows({ organisationId: actor.organisationId, entity: 'catalogue_item', entityId: id }, 200);
  return rows.map(({ row: r, author }) => ({
    id: r.id,
    action: r.action,
    summary: r.summary,
    diff: r.diff,
    user: author,
    at: r.createdAt.toISOString(),
  }));
}

export async function allItems(actor: CurrentUser): Promise<CatalogueItem[]> {
  const rows = await repo.allItemRows(actor.organisationId);
  return rows.map(toItem);
}

/** Thrown when an import file has problems: every problem by row and column, nothing written. */
export class ImportRejected extends ValidationError {
  constructor(readonly rowErrors: ImportError[]) {
    super(
      `The file has ${rowErrors.length} problem${rowErrors.length === 1 ? '' : 's'}; nothing was imported`,
      rowErrors.map((e) => ({
        path: e.row > 0 ? `row ${e.row}${e.column ? `, ${e.column}` : ''}` : e.column || 'file',
        message: e.message,
        row: e.row,
        column: e.column,
      })),
    );
  }
}

/**
 * Import a catalogue file: upsert by code in ONE transaction, or nothing at all when any row is bad.
 * Items of the shop that the file does not name stay as they are.
 */
export async function importCatalogue(actor: CurrentUser, buffer: Buffer, kind: 'xlsx' | 'csv'): Promise<ImportSummary> {
  const parsed = await parseCatalogueFile(buffer, kind);
  if (parsed.errors.length > 0) throw new ImportRejected(parsed.errors);
  return db().transaction(async (t) => {
    const existing = await repo.allItemRows(actor.organisationId, t, true);
    const byCode = new Map(existing.map((r) => [r.code, r]));
    const fresh: CatalogueItem[] = [];
    let updated = 0;
    let unchanged = 0;
    for (const item of parsed.rows) {
      const r = byCode.get(item.code);
      if (!r) {
        fresh.push(item);
        continue;
      }
      const diff = itemDiff(toItem(r), item);
      if (Object.keys(diff).length === 0) {
        unchanged++;
        continue;
      }
      await repo.writeItem(actor.organisationId, r.id, item, r.version + 1, t);
      await recordActivity(
        actor,
        {
          entity: 'catalogue_item',
          entityId: r.id,
          action: 'imported',
          summary: `Import changed ${item.code}: ${Object.keys(diff).join(', ')}`,
          diff,
        },
        t,
      );
      updated++;
    }
    if (fresh.length > 0) {
      const created = await repo.insertItems(actor.organisationId, fresh, t);
      for (const [i, r] of created.entries()) {
        await recordActivity(
          actor,
          {
            entity: 'catalogue_item',
            entityId: r.id,
            action: 'imported',
            summary: `Import added ${fresh[i]!.code}`,
            diff: itemDiff(null, fresh[i]!),
          },
          t,
        );
      }
    }
    return { created: fresh.length, updated, unchanged };
  });
}

// ---------------------------------------------------------------------------------------------
// Labour units

export async function listLabourUnits(actor: CurrentUser): Promise<LabourUnitEntry[]> {
  const rows = await repo.labourRows(actor.organisationId);
  return rows.map((r) => ({
    key: r.key as LabourKey,
    description: r.label,
    hours: r.hours,
    per: r.per as LabourUnit['per'],
    version: r.version,
  }));
}

export async function updateLabourUnit(
  actor: CurrentUser,
  key: LabourKey,
  changes: { hours?: number; description?: string },
  version: number,
): Promise<LabourUnitEntry> {
  return db().transaction(async (t) => {
    const r = await repo.findLabourUnitForUpdate(actor.organisationId, key, t);
    if (!r) throw new NotFoundError('Labour unit');
    if (r.version !== version)
      throw new ConflictError(
        `Someone else changed the labour unit "${r.label}" since you opened it: reload, then apply your change again`,
        { currentVersion: r.version },
      );
    const diff: Record<string, [unknown, unknown]> = {};
    if (changes.hours !== undefined && changes.hours !== r.hours) diff.hours = [r.hours, changes.hours];
    if (changes.description !== undefined && changes.description !== r.label) diff.description = [r.label, changes.description];
    if (Object.keys(diff).length > 0) {
      await repo.writeLabourUnit(
        r.id,
        version,
        {
          ...(changes.hours !== undefined ? { hours: changes.hours } : {}),
          ...(changes.description !== undefined ? { label: changes.description } : {}),
          version: version + 1,
        },
        t,
      );
      await recordActivity(
        actor,
        {
          entity: 'labour_unit',
          entityId: r.id,
          action: 'updated',
          summary: `Changed labour unit ${key}: ${Object.keys(diff).join(', ')}`,
          diff,
        },
        t,
      );
    }
    const now = (await repo.labourUnitById(r.id, t))!;
    return { key: now.key as LabourKey, description: now.label, hours: now.hours, per: now.per as LabourUnit['per'], version: now.version };
  });
}
