import { z } from 'zod';
import { versionSchema } from './bounds';
import type { SupplyInput } from './load';

export const CODE_EDITIONS = ['2023', '2020'] as const;

// Field rules without defaults: the update schema must not fill in absent fields (zod keeps defaults in .partial()).
const jobFields = {
  number: z.string().trim().min(1, 'Enter the job number').max(40),
  name: z.string().trim().min(1, 'Enter a job name').max(200),
  customer: z.string().trim().max(200),
  site: z.string().trim().max(200),
  supplyVolts: z.coerce.number().int().min(100, 'At least 100 V').max(1000, 'At most 1000 V (NEC 409 covers up to 1000 V)'),
  supplyPhases: z.coerce
    .number()
    .int()
    .refine((p) => p === 1 || p === 3, 'Single-phase (1) or three-phase (3)'),
  supplyHz: z.coerce
    .number()
    .int()
    .refine((h) => h === 50 || h === 60, '50 or 60 Hz'),
  availableFaultKa: z.coerce.number().min(0.1, 'At least 0.1 kA').max(200, 'At most 200 kA'),
  ambientC: z.coerce.number().min(-40).max(60, 'At most 60 °C'),
  voltageUnbalancePercent: z.coerce.number().min(0, 'At least 0 %').max(20, 'At most 20 %'),
  codeEdition: z.enum(CODE_EDITIONS),
  notes: z.string().max(5000),
};

export const JobInputSchema = z.object({
  ...jobFields,
  customer: jobFields.customer.default(''),
  site: jobFields.site.default(''),
  supplyVolts: jobFields.supplyVolts.default(480),
  supplyPhases: jobFields.supplyPhases.default(3),
  supplyHz: jobFields.supplyHz.default(60),
  availableFaultKa: jobFields.availableFaultKa.default(22),
  ambientC: jobFields.ambientC.default(30),
  voltageUnbalancePercent: jobFields.voltageUnbalancePercent.default(0),
  codeEdition: jobFields.codeEdition.default('2023'),
  notes: jobFields.notes.default(''),
});
export type JobInput = z.input<typeof JobInputSchema>;
export type JobValues = z.output<typeof JobInputSchema>;

export const JobUpdateSchema = z.object(jobFields).partial().extend({ version: versionSchema }).strict();

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
  /** measured voltage unbalance at the site, % (NEMA MG 1 14.36); 0 when none is known */
  voltageUnbalancePercent: number;
  codeEdition: string;
  notes: string;
  archivedAt: string | null;
  panelCount: number;
  motorCount: number;
  version: number;
  updatedAt: string;
}

/** The job fields the selection engine's supply is made of. */
export type JobSupplyFields = Pick<
  JobSummary,
  'supplyVolts' | 'supplyPhases' | 'supplyHz' | 'availableFaultKa' | 'ambientC' | 'voltageUnbalancePercent'
> & {
  /** the panel's answer (110.14(C)(1)(a)(3)); null or absent: not answered */
  terminationsListed75C?: boolean | null;
};

/** The selection engine's supply for a job (the server's stored selections and the browser preview alike). */
export function jobSupply(job: JobSupplyFields): SupplyInput {
  return {
    volts: job.supplyVolts,
    phases: job.supplyPhases as 1 | 3,
    hz: job.supplyHz as 50 | 60,
    availableFaultKa: job.availableFaultKa,
    ambientC: job.ambientC,
    voltageUnbalancePercent: job.voltageUnbalancePercent ?? 0,
    ...(typeof job.terminationsListed75C === 'boolean' ? { terminationsListed75C: job.terminationsListed75C } : {}),
  };
}
