import multer from 'multer';
import type { RequestHandler } from 'express';
import { defineRoute } from '../../http/route-table';
import { DomainError } from '../../../shared/errors';
import { LOGO_MAX_BYTES, LogoUploadSchema, ShopSettingsUpdateSchema } from '../../../shared/schemas/settings';
import * as service from './service';

const ALL = ['admin', 'designer', 'estimator', 'engineer'] as const;

const multerLogo = multer({ storage: multer.memoryStorage(), limits: { fileSize: LOGO_MAX_BYTES, files: 1, fields: 2, parts: 3 } }).single(
  'file',
);

/** The logo upload, with the size limit said in words. */
const uploadLogo: RequestHandler = (req, res, next) =>
  multerLogo(req, res, (err: unknown) => {
    if ((err as { code?: string } | undefined)?.code === 'LIMIT_FILE_SIZE') {
      return next(new DomainError('payload_too_large', `The logo is larger than ${LOGO_MAX_BYTES / 1024} KB: use a smaller image`));
    }
    next(err);
  });

export const settingsRoutes = [
  defineRoute({
    method: 'get',
    path: '/api/settings',
    access: ALL,
    summary: "The shop's settings: name, address, logo, pricing defaults, drawing numbers, sign-off rule",
    handler: ({ user }) => service.getSettings(user),
  }),
  defineRoute({
    method: 'put',
    path: '/api/settings',
    access: ['admin'],
    summary: "Change the shop's settings (409 when someone else changed them)",
    body: ShopSettingsUpdateSchema,
    handler: ({ user, body }) => service.updateSettings(user, body),
  }),
  defineRoute({
    method: 'get',
    path: '/api/settings/logo',
    access: ALL,
    summary: "The shop's logo (PNG or JPEG)",
    handler: async ({ user, res }) => {
      const logo = await service.logoOf(user.organisationId);
      if (!logo) {
        res.status(404).json({ error: { code: 'not_found', message: 'The shop has no logo', details: null } });
        return undefined;
      }
      res.setHeader('content-type', logo.contentType);
      res.setHeader('cache-control', 'private, no-cache');
      res.setHeader('x-content-type-options', 'nosniff');
      res.end(logo.data);
      return undefined;
    },
  }),
  defineRoute({
    method: 'put',
    path: '/api/settings/logo',
    access: ['admin'],
    summary: `Upload the shop's logo (multipart field "file", PNG or JPEG up to ${LOGO_MAX_BYTES / 1024} KB, with the settings' version)`,
    before: [uploadLogo],
    body: LogoUploadSchema,
    handler: ({ user, body, req }) => service.putLogo(user, body.version, req.file),
  }),
  defineRoute({
    method: 'delete',
    path: '/api/settings/logo',
    access: ['admin'],
    summary: "Remove the shop's logo",
    body: LogoUploadSchema,
    status: 200,
    handler: ({ user, body }) => service.deleteLogo(user, body.version),
  }),
];
