// Validation problems in plain sentences: one zod error map for every form (react-hook-form with
// zodResolver), the motor-list import preview and the API's 400 answers. A schema's own message
// (e.g. "Enter the job number") still comes first; this map words every issue that has none, in
// place of zod's developer texts ("Invalid input: expected number, received NaN").
//
// The sentence stands under its field (or beside its column in an import preview), so it does not
// repeat the field's name; `issueSentence` adds the name where no field is beside it.

import { z } from 'zod';
import { answerValueLabel, fieldLabel } from './labels';

type RawIssue = Parameters<z.core.$ZodErrorMap>[0];

const list = (xs: string[]) => (xs.length <= 1 ? xs.join('') : `${xs.slice(0, -1).join(', ')} or ${xs[xs.length - 1]}`);
const fmt = (n: unknown) =>
  typeof n === 'bigint'
    ? n.toString()
    : typeof n === 'number'
      ? n.toLocaleString('en-US', { maximumFractionDigits: 6, useGrouping: false })
      : String(n);
const isEmpty = (v: unknown) => v === undefined || v === null || v === '';

/** The plain sentence for one zod issue (the raw issue an error map receives). */
export function plainMessage(issue: RawIssue): string {
  const i = issue as RawIssue & Record<string, unknown>;
  const key = String((i.path ?? []).filter((p) => typeof p === 'string').at(-1) ?? '');
  switch (i.code) {
    case 'invalid_type': {
      const expected = String(i.expected);
      if (isEmpty(i.input)) return expected === 'array' ? 'Choose at least one.' : 'This is needed.';
      if (expected === 'number' || expected === 'int' || expected === 'bigint') {
        return expected === 'int' && typeof i.input === 'number' && Number.isFinite(i.input) ? 'Enter a whole number.' : 'Enter a number.';
      }
      if (expected === 'boolean') return 'Choose yes or no.';
      if (expected === 'string') return 'Enter text.';
      if (expected === 'date') return 'Enter a date.';
      return 'This answer has the wrong form.';
    }
    case 'too_small': {
      const min = i.minimum as number | bigint;
      if (i.origin === 'string') return Number(min) <= 1 ? 'This is needed.' : `Enter at least ${fmt(min)} characters.`;
      if (i.origin === 'array' || i.origin === 'set') return Number(min) <= 1 ? 'Choose at least one.' : `Choose at least ${fmt(min)}.`;
      if (i.origin === 'file') return 'The file is empty.';
      return i.inclusive === false
        ? Number(min) === 0
          ? 'Enter a number greater than 0.'
          : `Enter a number greater than ${fmt(min)}.`
        : `Enter ${fmt(min)} or more.`;
    }
    case 'too_big': {
      const max = i.maximum as number | bigint;
      if (i.origin === 'string') return `Keep it to ${fmt(max)} characters or fewer.`;
      if (i.origin === 'array' || i.origin === 'set') return `Choose no more than ${fmt(max)}.`;
      if (i.origin === 'file') return 'The file is too large.';
      return i.inclusive === false ? `Enter a number below ${fmt(max)}.` : `Enter ${fmt(max)} or less.`;
    }
    case 'invalid_value': {
      const values = ((i.values as unknown[]) ?? []).map((v) => answerValueLabel(key, v));
      return values.length === 1 ? `Must be ${values[0]}.` : `Choose ${list(values)}.`;
    }
    case 'invalid_union':
      return isEmpty(i.input) ? 'This is needed.' : 'Not one of the values this answer takes.';
    case 'invalid_format': {
      const format = String(i.format);
      if (format === 'email') return 'Enter an e-mail address, like name@example.com.';
      if (format === 'url') return 'Enter a web address.';
      if (format === 'regex') return 'Not in the expected form.';
      if (format.startsWith('date') || format === 'datetime') return 'Enter a date.';
      return 'Not in the expected form.';
    }
    case 'not_multiple_of':
      return `Enter a multiple of ${fmt(i.divisor)}.`;
    case 'unrecognized_keys': {
      const keys = ((i.keys as string[]) ?? []).map((k) => fieldLabel(k) ?? k);
      return `Not an answer this form takes: ${list(keys)}.`;
    }
    case 'invalid_key':
    case 'invalid_element':
      return 'One of the entries is not valid.';
    case 'custom':
      return 'This answer is not valid.';
    default:
      return 'This answer is not valid.';
  }
}

/** Installs the plain sentences as zod's error map for the whole process or page. Idempotent. */
export function installPlainMessages(): void {
  z.config({ customError: (issue) => plainMessage(issue) });
}

/**
 * One issue for a place with no field beside it (a summary line, an import commit's refusal):
 * "Horsepower: Enter 1000 or less." — the field's label, never its key.
 */
export function issueSentence(path: string, message: string): string {
  const label = path ? fieldLabel(path) : undefined;
  return label ? `${label}: ${message}` : message;
}

// A module that imports this one gets the plain sentences: the browser's forms (through the schemas),
// the server and the CLI all read the same map.
installPlainMessages();
