import { z } from 'zod';
import { versionSchema } from './bounds';

/** The decisions a designer may override, each always with a written justification. */
export const OVERRIDE_FIELDS = {
  'starter.type': 'Starter type',
  'starter.nemaSize': 'NEMA starter size',
  'scpd.type': 'Protective device type',
  'scpd.ratingAmps': 'Protective device rating (A)',
  'conductor.size': 'Branch conductor size',
  'overload.tripClass': 'Overload trip class',
  'enclosure.nemaType': 'Enclosure NEMA type',
  'relays.phaseLoss': 'Phase-loss relay',
  'relays.phaseReversal': 'Phase-reversal relay',
} as const;

export type OverrideField = keyof typeof OVERRIDE_FIELDS;

export const OverrideInputSchema = z.object({
  field: z.enum(Object.keys(OVERRIDE_FIELDS) as [OverrideField, ...OverrideField[]]),
  value: z.union([z.string().trim().min(1).max(40), z.number().positive().max(10000), z.boolean()]),
  justification: z.string().trim().min(15, 'Write a justification of at least 15 characters').max(2000),
});
export type OverrideInput = z.infer<typeof OverrideInputSchema>;

export const OverridesPutSchema = z.object({
  overrides: z.array(OverrideInputSchema).max(20),
  version: versionSchema,
});

export interface StoredOverride extends OverrideInput {
  by: string;
  at: string;
  /** the engine's value that was overridden */
  was: unknown;
  /** warnings for the engineer (e.g. above the 430.52 maximum) */
  warnings: string[];
}
