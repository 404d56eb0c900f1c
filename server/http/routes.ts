// The route table: every module's routes, listed once, in the order Express tries them. createApp()
// mounts exactly this list (and fills `routeTable`, which the role-matrix, security and fuzz tests walk).
// A module's router exports its own routes and never another module's.
import type { RequestHandler } from 'express';
import type { AnyRoute } from './route-table';
import { authRoutes } from '../modules/auth/router';
import { userRoutes } from '../modules/users/router';
import { jobRoutes } from '../modules/jobs/router';
import { mailRoutes } from '../modules/mail/router';
import { panelRoutes } from '../modules/panels/router';
import { reviewRoutes } from '../modules/review/router';
import { importRoutes } from '../modules/panels/import-router';
import { catalogueRoutes } from '../modules/catalogue/router';
import { bomRoutes } from '../modules/bom/router';
import { backupRoutes } from '../modules/backup/router';
import { checkRoutes } from '../modules/checks/router';
import { submittalRoutes } from '../modules/submittal/router';
import { settingsRoutes } from '../modules/settings/router';
import { drawingRoutes } from '../modules/drawings/router';

/** Every API route; `signInLimiter` is the app's own throttle for the sign-in route. */
export function allRoutes(signInLimiter: RequestHandler): AnyRoute[] {
  return [
    ...authRoutes(signInLimiter),
    ...userRoutes,
    ...jobRoutes,
    ...mailRoutes,
    ...panelRoutes,
    ...reviewRoutes,
    ...importRoutes,
    ...catalogueRoutes,
    ...bomRoutes,
    ...backupRoutes,
    ...checkRoutes,
    ...submittalRoutes,
    ...settingsRoutes,
    ...drawingRoutes,
  ];
}
