// The migrations in order. Imported statically so that tsx, vitest and a bundler all load them alike.
import * as m0001 from './0001-foundation';
import * as m0002 from './0002-panel-rollup';
import * as m0003 from './0003-catalogue-fields';
import * as m0004 from './0004-change-feed';
import * as m0005 from './0005-catalogue-feed';
import * as m0006 from './0006-voltage-unbalance';
import * as m0007 from './0007-combination-ratings';
import * as m0008 from './0008-shop-settings';
import * as m0009 from './0009-panel-terminations-75c';
import * as m0010 from './0010-catalogue-dimensions';

export const migrations = [
  ['0001-foundation', m0001],
  ['0002-panel-rollup', m0002],
  ['0003-catalogue-fields', m0003],
  ['0004-change-feed', m0004],
  ['0005-catalogue-feed', m0005],
  ['0006-voltage-unbalance', m0006],
  ['0007-combination-ratings', m0007],
  ['0008-shop-settings', m0008],
  ['0009-panel-terminations-75c', m0009],
  ['0010-catalogue-dimensions', m0010],
] as const;
