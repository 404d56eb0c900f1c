// Tested combination ratings (UL 508A SB4): catalogue parts of one bucket tested together to a
// short-circuit current rating, from a listing or a maker's published combination table.
import { z } from 'zod';
import { versionSchema } from './bounds';
import { PartCodeSchema } from './catalogue';

const fields = {
  ref: z
    .string()
    .trim()
    .min(1, 'Give the combination a reference')
    .max(60)
    .regex(/^[A-Za-z0-9][A-Za-z0-9._-]*$/, 'letters, digits, dot, dash and underscore'),
  componentCodes: z
    .array(PartCodeSchema)
    .min(2, 'a combination has at least two parts')
    .max(8, 'at most 8 parts')
    .refine((codes) => new Set(codes).size === codes.length, 'each part once'),
  ratingKa: z.number().min(0.1, 'at least 0.1 kA').max(200, 'at most 200 kA'),
  maxVolts: z.number().int().min(100).max(1000).nullable(),
  source: z.string().trim().min(3, 'Name the listing or the maker’s table it comes from').max(300),
  active: z.boolean(),
};

export const CombinationInputSchema = z
  .object({ ...fields, maxVolts: fields.maxVolts.default(null), active: fields.active.default(true) })
  .strict();
export type CombinationInput = z.input<typeof CombinationInputSchema>;
export type CombinationValues = z.output<typeof CombinationInputSchema>;

export const CombinationUpdateSchema = z
  .object({
    componentCodes: fields.componentCodes,
    ratingKa: fields.ratingKa,
    maxVolts: fields.maxVolts,
    source: fields.source,
    active: fields.active,
  })
  .partial()
  .extend({ version: versionSchema })
  .strict();

export const CombinationFileSchema = z.array(CombinationInputSchema);

export interface CombinationView {
  id: number;
  ref: string;
  componentCodes: string[];
  ratingKa: number;
  maxVolts: number | null;
  source: string;
  active: boolean;
  version: number;
  updatedAt: string;
}
