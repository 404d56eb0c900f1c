import multer from 'multer';
import { z } from 'zod';
import { idParamSchema, versionSchema } from '../../../shared/schemas/bounds';
import { defineRoute } from '../../http/route-table';
import { ROLE_SETS } from '../../../shared/schemas/auth';
import { CatalogueItemBaseSchema, CatalogueItemSchema, CategorySchema, LabourKeySchema } from '../../../shared/schemas/catalogue';
import { ValidationError } from '../../../shared/errors';
import { IMPORT_LIMITS, catalogueToCsv, writeCatalogueXlsx } from './spreadsheet';
import { UnsupportedFile } from '../../http/sheet-rows';
import { sendAttachment } from '../../http/attachment';
import * as service from './service';
import * as combinations from './combinations';
import { CombinationInputSchema, CombinationUpdateSchema } from '../../../shared/schemas/combination';

const ItemId = z.object({ itemId: idParamSchema });
const Version = versionSchema;

const ListQuery = z.object({
  category: CategorySchema.optional(),
  q: z.string().max(100).optional(),
  active: z.enum(['true', 'false', 'all']).optional(),
});

/**
 * Any field but the code (the key the bills of materials refer to); the whole item is validated after merging.
 * The defaults are taken off so that a field left out stays as it is instead of going back to its default.
 */
const B = CatalogueItemBaseSchema.shape;
const ItemPatch = z
  .object({
    description: B.description.optional(),
    category: B.category.optional(),
    unit: B.unit.unwrap().optional(),
    ratings: B.ratings.optional(),
    sccrKa: B.sccrKa.unwrap().optional(),
    outlineWidthMm: B.outlineWidthMm,
    outlineHeightMm: B.outlineHeightMm,
    outlineDepthMm: B.outlineDepthMm,
    clearanceAboveMm: B.clearanceAboveMm,
    clearanceBelowMm: B.clearanceBelowMm,
    heatLossW: B.heatLossW.unwrap().optional(),
    unitCost: B.unitCost.optional(),
    labourHours: B.labourHours.unwrap().optional(),
    terminations: B.terminations.unwrap().optional(),
    leadTimeDays: B.leadTimeDays.optional(),
    active: B.active.unwrap().optional(),
    version: Version,
  })
  .strict();

const XLSX_TYPES = new Set([
  'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
  'application/octet-stream',
  'application/zip',
]);
const CSV_TYPES = new Set(['text/csv', 'text/plain', 'application/csv', 'application/vnd.ms-excel', 'application/octet-stream']);

export function fileKind(name: string, mime: string): 'xlsx' | 'csv' {
  const lower = name.toLowerCase();
  if (lower.endsWith('.xlsx') && XLSX_TYPES.has(mime)) return 'xlsx';
  if (lower.endsWith('.csv') && CSV_TYPES.has(mime)) return 'csv';
  throw new UnsupportedFile('Upload the catalogue as an .xlsx workbook or a .csv file');
}

const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: IMPORT_LIMITS.maxFileBytes, files: 1, fields: 5, parts: 6 },
  fileFilter: (_req, file, cb) => {
    try {
      fileKind(file.originalname, file.mimetype);
      cb(null, true);
    } catch (e) {
      cb(e as Error);
    }
  },
}).single('file');

const stamp = () => new Date().toISOString().slice(0, 10);

export const catalogueRoutes = [
  defineRoute({
    method: 'get',
    path: '/api/catalogue/items',
    access: ROLE_SETS.everyone,
    summary: 'Catalogue items (filter by category, text in code or description, active)',
    query: ListQuery,
    handler: ({ user, query }) => service.listItems(user, query),
  }),
  defineRoute({
    method: 'post',
    path: '/api/catalogue/items',
    access: ROLE_SETS.estimate,
    summary: 'Add a catalogue item',
    body: CatalogueItemSchema,
    handler: ({ user, body }) => service.createItem(user, body),
  }),
  defineRoute({
    method: 'get',
    path: '/api/catalogue/items/:itemId',
    access: ROLE_SETS.everyone,
    summary: 'One catalogue item',
    params: ItemId,
    handler: ({ user, params }) => service.getItem(user, params.itemId),
  }),
  defineRoute({
    method: 'patch',
    path: '/api/catalogue/items/:itemId',
    access: ROLE_SETS.estimate,
    summary: 'Change a catalogue item (price, labour, lead time, ratings …); 409 when the version is stale',
    params: ItemId,
    body: ItemPatch,
    handler: ({ user, params, body }) => {
      const { version, ...changes } = body;
      return service.updateItem(user, params.itemId, changes, version);
    },
  }),
  defineRoute({
    method: 'post',
    path: '/api/catalogue/items/:itemId/active',
    access: ROLE_SETS.estimate,
    summary: 'Deactivate or reactivate a catalogue item',
    params: ItemId,
    body: z.object({ active: z.boolean(), version: Version }).strict(),
    status: 200,
    handler: ({ user, params, body }) => service.setActive(user, params.itemId, body.active, body.version),
  }),
  defineRoute({
    method: 'get',
    path: '/api/catalogue/items/:itemId/history',
    access: ROLE_SETS.everyone,
    summary: 'Who changed a catalogue item, what and when',
    params: ItemId,
    handler: ({ user, params }) => service.itemHistory(user, params.itemId),
  }),
  defineRoute({
    method: 'get',
    path: '/api/catalogue.xlsx',
    access: ROLE_SETS.everyone,
    summary: 'The whole catalogue as .xlsx (streamed)',
    handler: async ({ user, res }) => {
      const items = await service.allItems(user);
      res.setHeader('content-type', 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet');
      res.setHeader('content-disposition', `attachment; filename="panelwright-catalogue-${stamp()}.xlsx"`);
      await writeCatalogueXlsx(items, res);
      return undefined;
    },
  }),
  defineRoute({
    method: 'get',
    path: '/api/catalogue.csv',
    access: ROLE_SETS.everyone,
    summary: 'The whole catalogue as .csv',
    handler: async ({ user, res }) =>
      sendAttachment(res, `panelwright-catalogue-${stamp()}`, 'csv', `\uFEFF${catalogueToCsv(await service.allItems(user))}`),
  }),
  defineRoute({
    method: 'post',
    path: '/api/catalogue/import',
    access: ROLE_SETS.estimate,
    summary: 'Import .xlsx/.csv: every row good, or nothing written (errors listed by row)',
    before: [upload],
    status: 200,
    handler: ({ user, req }) => {
      const f = req.file;
      if (!f) throw new ValidationError('Choose an .xlsx or .csv file to upload', [{ path: 'file', message: 'no file uploaded' }]);
      return service.importCatalogue(user, f.buffer, fileKind(f.originalname, f.mimetype));
    },
  }),
  defineRoute({
    method: 'get',
    path: '/api/labour-units',
    access: ROLE_SETS.everyone,
    summary: "The shop's labour units",
    handler: ({ user }) => service.listLabourUnits(user),
  }),
  defineRoute({
    method: 'patch',
    path: '/api/labour-units/:key',
    access: ROLE_SETS.estimate,
    summary: 'Change a labour unit (hours, description)',
    params: z.object({ key: LabourKeySchema }),
    body: z
      .object({
        hours: z.number().finite().nonnegative().max(100).optional(),
        description: z.string().trim().min(1).max(200).optional(),
        version: Version,
      })
      .strict(),
    handler: ({ user, params, body }) => service.updateLabourUnit(user, params.key, body, body.version),
  }),
  defineRoute({
    method: 'get',
    path: '/api/catalogue/combinations',
    access: ROLE_SETS.everyone,
    summary: 'Tested combination ratings (UL 508A SB4)',
    handler: ({ user }) => combinations.listCombinations(user),
  }),
  defineRoute({
    method: 'post',
    path: '/api/catalogue/combinations',
    access: ROLE_SETS.editCombinations,
    summary: 'Add a tested combination rating',
    body: CombinationInputSchema,
    handler: ({ user, body }) => combinations.createCombination(user, body),
  }),
  defineRoute({
    method: 'get',
    path: '/api/catalogue/combinations.csv',
    access: ROLE_SETS.everyone,
    summary: 'The tested combination ratings as .csv (the import format)',
    handler: async ({ user, res }) =>
      sendAttachment(res, `panelwright-combinations-${stamp()}`, 'csv', `\uFEFF${await combinations.combinationsCsv(user)}`),
  }),
  defineRoute({
    method: 'post',
    path: '/api/catalogue/combinations/import',
    access: ROLE_SETS.editCombinations,
    summary: 'Import a combination table (.csv/.xlsx): every row good, or nothing written (problems listed by row)',
    before: [upload],
    status: 200,
    handler: ({ user, req }) => {
      const f = req.file;
      if (!f) throw new ValidationError('Choose a .csv or .xlsx file to upload', [{ path: 'file', message: 'no file uploaded' }]);
      return combinations.importCombinations(user, f.buffer, fileKind(f.originalname, f.mimetype));
    },
  }),
  defineRoute({
    method: 'patch',
    path: '/api/catalogue/combinations/:combinationId',
    access: ROLE_SETS.editCombinations,
    summary: 'Change or deactivate a tested combination rating; 409 when the version is stale',
    params: z.object({ combinationId: idParamSchema }),
    body: CombinationUpdateSchema,
    handler: ({ user, params, body }) => combinations.updateCombination(user, params.combinationId, body),
  }),
];
