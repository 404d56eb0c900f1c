import { z } from 'zod';

export const CODE_EDITIONS = ['2023', '2020'] as const;

export const JobInputSchema = z.object({
  number: z.string().trim().min(1, 'Enter the job number').max(40),
  name: z.string().trim().min(1, 'Enter a job name').max(200),
  customer: z.string().trim().max(200).default(''),
  site: z.string().trim().max(200).default(''),
  supplyVolts: z.coerce.number().int().min(100, 'At least 100 V').max(1000, 'At most 1000 V (NEC 409 covers up to 1000 V)').default(480),
  supplyPhases: z.coerce.number().int().refine((p) => p === 1 || p === 3, 'Single-phase (1) or three-phase (3)').default(3),
  supplyHz: z.coerce.number().int().refine((h) => h === 50 || h === 60, '50 or 60 Hz').default(60),
  availableFaultKa: z.coerce.number().min(0.1, 'At least 0.1 kA').max(200, 'At most 200 kA').default(22),
  ambientC: z.coerce.number().min(-40).max(60, 'At most 60 °C').default(30),
  codeEdition: z.enum(CODE_EDITIONS).default('2023'),
  notes: z.string().max(5000).default(''),
});
export type JobInput = z.input<typeof JobInputSchema>;
export type JobValues = z.output<typeof JobInputSchema>;

export const JobUpdateSchema = JobInputSchema.partial().extend({ version: z.number().int().min(0) }).strict();

export const JobListQuerySchema = z.object({
  q: z.string().trim().max(100).optional(),
  archived: z.enum(['true', 'false']).default('false'),
  sort: z.enum(['number', 'name', 'customer', 'updatedAt']).default('updatedAt'),
});

export interface JobSummary {
  id: number;
  number: string;
  name: string;
  customer: string;
  site: string;
  supplyVolts: number;
  supplyPhases: number;
  supplyHz: number;
  availableFaultKa: number;
  ambientC: number;
  codeEdition: string;
  notes: string;
  archivedAt: string | null;
  panelCount: number;
  motorCount: number;
  version: number;
  updatedAt: string;
}
