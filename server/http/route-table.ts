// Every API route is declared here through defineRoute: its method, path, the roles allowed and the
// schemas of its input. The role check, CSRF check and validation run before the handler; the
// role-matrix test walks this same table.
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import type { z } from 'zod';
import type { CurrentUser, Role } from '../../shared/schemas/auth';
import { ForbiddenError, UnauthenticatedError, ValidationError, zodIssues } from '../../shared/errors';
import { issueSentence } from '../../shared/plain-messages';

export type Access = 'public' | 'signed-in' | readonly Role[];
export type Method = 'get' | 'post' | 'patch' | 'put' | 'delete';

export interface RouteContext<B, Q, P> {
  user: CurrentUser;
  body: B;
  query: Q;
  params: P;
  req: Request;
  res: Response;
}

type Schema = z.ZodType;
type Out<S> = S extends z.ZodType ? z.output<S> : undefined;

export interface RouteSpec<BS = undefined, QS = undefined, PS = undefined> {
  method: Method;
  path: string;
  access: Access;
  summary: string;
  body?: BS;
  query?: QS;
  params?: PS;
  /** middleware that must run before validation (e.g. multer for uploads) */
  before?: RequestHandler[];
  /** return a value to send it as JSON (201 for post unless status set); return undefined when the handler answered itself */
  handler: (ctx: RouteContext<Out<BS>, Out<QS>, Out<PS>>) => Promise<unknown> | unknown;
  status?: number;
}

export type AnyRoute = RouteSpec<Schema | undefined, Schema | undefined, Schema | undefined>;

export const routeTable: AnyRoute[] = [];

export function defineRoute<
  BS extends Schema | undefined = undefined,
  QS extends Schema | undefined = undefined,
  PS extends Schema | undefined = undefined,
>(spec: RouteSpec<BS, QS, PS>): AnyRoute {
  return spec as unknown as AnyRoute; // cast: the table holds routes of every schema; the handler's typed context is checked here, at the definition
}

function parsePart(schema: Schema | undefined, value: unknown, where: string) {
  if (!schema) return undefined;
  const r = schema.safeParse(value ?? {});
  if (!r.success) {
    const issues = zodIssues(r.error.issues).map((i) => ({ ...i, path: i.path ? `${where}.${i.path}` : where }));
    // the summary names each field by its label, never its key; the details keep the path for the form
    throw new ValidationError(
      `Check ${issues.length === 1 ? 'this answer' : `these ${issues.length} answers`}: ${issues.map((i) => issueSentence(i.path, i.message)).join('; ')}`,
      issues,
    );
  }
  return r.data;
}

export function checkAccess(access: Access, user: CurrentUser | undefined) {
  if (access === 'public') return;
  if (!user) throw new UnauthenticatedError();
  if (access === 'signed-in') return;
  if (!user.roles.some((r) => access.includes(r))) {
    throw new ForbiddenError(`This needs the role ${access.join(' or ')}`);
  }
}

export function toHandlers(spec: AnyRoute): RequestHandler[] {
  const guard: RequestHandler = (req, _res, next) => {
    checkAccess(spec.access, req.user as CurrentUser | undefined);
    next();
  };
  const run = async (req: Request, res: Response, _next: NextFunction) => {
    const ctx = {
      user: req.user as CurrentUser,
      body: parsePart(spec.body, req.body, 'body'),
      query: parsePart(spec.query, req.query, 'query'),
      params: parsePart(spec.params, req.params, 'params'),
      req,
      res,
    };
    const out = await spec.handler(ctx as never);
    if (out === undefined) {
      if (!res.headersSent) res.status(204).end();
      return;
    }
    res.status(spec.status ?? (spec.method === 'post' ? 201 : 200)).json(out);
  };
  return [guard, ...(spec.before ?? []), run];
}
