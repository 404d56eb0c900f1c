import { z } from 'zod';
import { versionSchema } from './bounds';

/** The tokens a drawing-number scheme may hold; `{sheet}` numbers each page, `{sheet:3}` pads it to 3 digits. */
export const DRAWING_TOKENS = ['job', 'panel', 'rev', 'sheet'] as const;
export type DrawingToken = (typeof DRAWING_TOKENS)[number];

export const DEFAULT_DRAWING_SCHEME = '{job}-{panel}-{sheet:2}';
export const DEFAULT_LABOUR_RATE = 85;
export const DEFAULT_MARKUP_PERCENT = 15;

/** The logo: a PNG or JPEG of at most this many bytes (enough for a crisp title-block mark). */
export const LOGO_MAX_BYTES = 512 * 1024;
export const LOGO_TYPES = ['image/png', 'image/jpeg'] as const;

const TOKEN_RE = /\{([^{}]*)\}/g;

/** What is wrong with a drawing-number scheme, in plain words; empty when it is usable. */
export function drawingSchemeProblems(scheme: string): string[] {
  const problems: string[] = [];
  const found = new Set<string>();
  for (const m of scheme.matchAll(TOKEN_RE)) {
    const [name, pad] = m[1].split(':');
    if (!(DRAWING_TOKENS as readonly string[]).includes(name)) {
      problems.push(`{${m[1]}} is not a known part: use {job}, {panel}, {rev} or {sheet}`);
      continue;
    }
    if (pad !== undefined && (name !== 'sheet' || !/^[1-4]$/.test(pad)))
      problems.push(`{${m[1]}}: only the sheet takes a width, 1 to 4 digits, as in {sheet:2}`);
    found.add(name);
  }
  const rest = scheme.replace(TOKEN_RE, '');
  if (/[{}]/.test(rest)) problems.push('Every { needs its }');
  if (/[^A-Za-z0-9 ._/#-]/.test(rest)) problems.push('Between the parts use letters, digits, spaces and . _ / # - only');
  if (!found.has('sheet')) problems.push('Put {sheet} in the scheme, so that every page has its own drawing number');
  return problems;
}

export interface DrawingNumberParts {
  job: string;
  panel: string;
  /** e.g. "R2", or "D" for a draft */
  rev: string;
  sheet: number;
}

/** A drawing number from the scheme; spaces inside the job number and panel name become dashes. */
export function drawingNumber(scheme: string, parts: DrawingNumberParts): string {
  const clean = (s: string) => s.trim().replace(/\s+/g, '-');
  return scheme.replace(TOKEN_RE, (_all, inner: string) => {
    const [name, pad] = inner.split(':');
    if (name === 'sheet') return String(parts.sheet).padStart(pad ? Number(pad) : 1, '0');
    if (name === 'job') return clean(parts.job);
    if (name === 'panel') return clean(parts.panel);
    if (name === 'rev') return clean(parts.rev);
    return `{${inner}}`;
  });
}

const money = (max: number, what: string) =>
  z
    .number({ error: `Enter the ${what} as a number` })
    .finite(`Enter the ${what} as a number`)
    .min(0, `The ${what} cannot be negative`)
    .max(max, `The ${what} is at most ${max}`);

/** The fields of the shop settings form (the same rules on the server). */
export const ShopSettingsFields = z.object({
  name: z.string().trim().min(1, 'Enter the shop name').max(200, 'Use at most 200 characters'),
  address: z.string().trim().max(500, 'Use at most 500 characters'),
  defaultLabourRate: money(1000, 'labour rate'),
  defaultMarkupPercent: money(300, 'markup'),
  drawingNumberScheme: z
    .string()
    .trim()
    .min(1, 'Enter a drawing-number scheme')
    .max(80, 'Use at most 80 characters')
    .superRefine((s, ctx) => {
      for (const message of drawingSchemeProblems(s)) ctx.addIssue({ code: 'custom', message });
    }),
  allowSelfSignOff: z.boolean(),
});
export type ShopSettingsInput = z.infer<typeof ShopSettingsFields>;

export const ShopSettingsUpdateSchema = ShopSettingsFields.extend({ version: versionSchema }).strict();
export type ShopSettingsUpdate = z.infer<typeof ShopSettingsUpdateSchema>;

/** The logo upload's form field besides the file. */
export const LogoUploadSchema = z.object({ version: z.coerce.number().pipe(versionSchema) });

export interface ShopSettings extends ShopSettingsInput {
  logo: { contentType: string; bytes: number; updatedAt: string } | null;
  version: number;
  updatedAt: string;
}
