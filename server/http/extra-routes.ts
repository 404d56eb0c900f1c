// Routes of the panel, catalogue, bill-of-materials and shop-settings modules, collected here so app.ts stays short.
import type { AnyRoute } from './route-table';
import { panelRoutes } from '../modules/panels/router';
import { importRoutes } from '../modules/panels/import-router';
import { estimatingRoutes } from '../modules/bom/router';
import { backupRoutes } from '../modules/backup/router';
import { checkRoutes } from '../modules/checks/router';
import { settingsRoutes } from '../modules/settings/router';
import { drawingRoutes } from '../modules/drawings/router';

export function extraRoutes(): AnyRoute[] {
  return [...panelRoutes, ...importRoutes, ...estimatingRoutes, ...backupRoutes, ...checkRoutes, ...settingsRoutes, ...drawingRoutes];
}
