import type { Response } from 'express';

/** A download: an ASCII file name for content-disposition, with the exact name in filename* (RFC 6266). */
export function attachment(res: Response, base: string, ext: 'xlsx' | 'csv') {
  const name = `${base}.${ext}`;
  const ascii = name.replace(/[^A-Za-z0-9._-]+/g, '-').replace(/-+/g, '-');
  res.setHeader('content-disposition', `attachment; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(name)}`);
  res.setHeader(
    'content-type',
    ext === 'xlsx' ? 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet' : 'text/csv; charset=utf-8',
  );
}

/** A whole download in one go: the headers of `attachment`, then the body; the handler returns nothing. */
export function sendAttachment(res: Response, base: string, ext: 'xlsx' | 'csv', body: Buffer | string): undefined {
  attachment(res, base, ext);
  res.end(body);
  return undefined;
}
