// Bounds of the numbers the database keeps in 32-bit INTEGER columns (PostgreSQL: -2147483648 to
// +2147483647). Every id, version, position and count a request carries goes through one of these, so
// a value the column cannot hold is refused as invalid input (400) before any query runs.
import { z } from 'zod';

/** Largest value of a PostgreSQL INTEGER (int4) column. */
export const INT4_MAX = 2_147_483_647;

const tooLarge = `at most ${INT4_MAX.toLocaleString('en-US')}`;

/** A row id (SERIAL / INTEGER primary key): 1 … 2,147,483,647. */
export const idSchema = z.number().int().min(1).max(INT4_MAX, tooLarge);
/** An edit counter kept with every row two people can edit (INTEGER, starts at 0). */
export const versionSchema = z.number().int().min(0).max(INT4_MAX, tooLarge);
/** An order within a list (INTEGER, from 0). */
export const positionSchema = z.number().int().min(0).max(INT4_MAX, tooLarge);
/** A count or a sequence number such as a revision number (INTEGER, from 0). */
export const countSchema = z.number().int().min(0).max(INT4_MAX, tooLarge);

/** The same as text in a path or query string (`/api/panels/:panelId`, `?from=3`). */
export const idParamSchema = z.coerce.number().int().min(1).max(INT4_MAX, tooLarge);
export const countParamSchema = z.coerce.number().int().min(0).max(INT4_MAX, tooLarge);
