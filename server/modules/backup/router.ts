import multer from 'multer';
import type { RequestHandler } from 'express';
import { defineRoute } from '../../http/route-table';
import { IdParamSchema, ROLE_SETS } from '../../../shared/schemas/auth';
import { DomainError } from '../../../shared/errors';
import * as service from './service';
import { JobBackupSchema, MAX_BACKUP_BYTES } from './schema';

const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_BACKUP_BYTES, files: 1, fields: 0, parts: 1 } }).single(
  'file',
);

/**
 * The backup arrives either as a JSON body (up to the API's 1 MB body limit) or, for larger jobs, as
 * a .json file in a multipart upload (field "file"); the file's JSON becomes the body validated below.
 */
const backupFile: RequestHandler = (req, _res, next) => {
  const f = req.file;
  if (!f) return next();
  const named = /\.json$/i.test(f.originalname);
  const typed = ['application/json', 'application/octet-stream', 'text/plain', ''].includes(f.mimetype);
  if (!named || !typed)
    return next(
      new DomainError('unsupported_file', 'A job backup is a .json file exported from Panelwright', [
        { path: 'file', message: 'not a .json file' },
      ]),
    );
  try {
    req.body = JSON.parse(f.buffer.toString('utf8'));
  } catch {
    return next(new DomainError('bad_json', 'The uploaded file is not valid JSON', [{ path: 'file', message: 'not valid JSON' }]));
  }
  next();
};

export const backupRoutes = [
  defineRoute({
    method: 'get',
    path: '/api/jobs/:id/export',
    access: ROLE_SETS.design,
    summary: 'Export a whole job as a JSON backup',
    params: IdParamSchema,
    handler: async ({ user, params, res }) => {
      const backup = await service.exportJob(user, params.id);
      const file = `${backup.job.number.replace(/[^A-Za-z0-9._-]+/g, '_')}.panelwright.json`;
      res.setHeader('content-disposition', `attachment; filename="${file}"`);
      return backup;
    },
  }),
  defineRoute({
    method: 'post',
    path: '/api/jobs/import',
    access: ROLE_SETS.design,
    summary: 'Create a new job from a JSON backup (all or nothing)',
    before: [upload, backupFile],
    body: JobBackupSchema,
    handler: ({ user, body }) => service.importJob(user, body),
  }),
];
