import multer from 'multer';
import { z } from 'zod';
import { idParamSchema } from '../../../shared/schemas/bounds';
import { defineRoute } from '../../http/route-table';
import { ROLE_SETS } from '../../../shared/schemas/auth';
import { ValidationError } from '../../../shared/errors';
import { MAX_IMPORT_BYTES, commitImport, importTemplate, panelPreview } from './import';
import { motorListExport } from './motor-list';
import { sendAttachment } from '../../http/attachment';

const PanelId = z.object({ panelId: idParamSchema });

const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_IMPORT_BYTES, files: 1, fields: 5, parts: 6 },
}).single('file');

function requireFile(file: Express.Multer.File | undefined): Express.Multer.File {
  if (!file) throw new ValidationError('Choose an .xlsx or .csv file to upload', [{ path: 'file', message: 'no file uploaded' }]);
  return file;
}

export const importRoutes = [
  defineRoute({
    method: 'get',
    path: '/api/panels/:panelId/motors.xlsx',
    access: ROLE_SETS.everyone,
    summary: "The panel's motor list (.xlsx): every answer in the import format, the selections as a schedule",
    params: PanelId,
    handler: async ({ user, params, res }) => {
      const out = await motorListExport(user, params.panelId);
      return sendAttachment(res, out.base, 'xlsx', out.buffer);
    },
  }),
  defineRoute({
    method: 'get',
    path: '/api/panels/:panelId/import/template',
    access: ROLE_SETS.design,
    summary: 'Motor-list template (.xlsx)',
    params: PanelId,
    handler: async ({ user, params, res }) =>
      sendAttachment(res, 'panelwright-motor-list', 'xlsx', await importTemplate(user, params.panelId)),
  }),
  defineRoute({
    method: 'post',
    path: '/api/panels/:panelId/import/preview',
    access: ROLE_SETS.design,
    summary: 'Preview a motor-list upload: every row with its problems, nothing saved',
    params: PanelId,
    before: [upload],
    status: 200,
    handler: ({ user, params, req }) => {
      const f = requireFile(req.file);
      return panelPreview(user, params.panelId, f.buffer, f.originalname);
    },
  }),
  defineRoute({
    method: 'post',
    path: '/api/panels/:panelId/import/commit',
    access: ROLE_SETS.design,
    summary: 'Import a motor list: all rows or none',
    params: PanelId,
    before: [upload],
    handler: ({ user, params, req }) => {
      const f = requireFile(req.file);
      return commitImport(user, params.panelId, f.buffer, f.originalname);
    },
  }),
];
