// The migrations in order. Imported statically so that tsx, vitest and a bundler all load them alike.
import * as m0001 from './0001-foundation';

export const migrations = [['0001-foundation', m0001]] as const;
