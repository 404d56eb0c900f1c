// Typed domain errors. No HTTP codes here: the server's error middleware maps `code` to a status.

export interface FieldIssue {
  path: string;
  message: string;
}

export class DomainError extends Error {
  readonly code: string;
  readonly details: unknown;
  constructor(code: string, message: string, details?: unknown) {
    super(message);
    this.name = new.target.name;
    this.code = code;
    this.details = details ?? null;
  }
}

export class ValidationError extends DomainError {
  declare readonly details: FieldIssue[];
  constructor(message: string, issues: FieldIssue[] = []) {
    super('validation_failed', message, issues);
  }
}

export class NotFoundError extends DomainError {
  constructor(what: string) {
    super('not_found', `${what} was not found`);
  }
}

export class ConflictError extends DomainError {
  constructor(message: string, details?: unknown) {
    super('conflict', message, details);
  }
}

export class ForbiddenError extends DomainError {
  constructor(message = 'Your role does not allow this') {
    super('forbidden', message);
  }
}

export class UnauthenticatedError extends DomainError {
  constructor(message = 'Sign in first') {
    super('unauthenticated', message);
  }
}

/** A lookup in a published table with a value the table does not cover. */
export class OutsideTableError extends DomainError {
  constructor(table: string, message: string) {
    super('outside_table', `${table}: ${message}`, { table });
  }
}

/** A rule file that fails validation at load: names the file and the problem. */
export class RuleFileError extends DomainError {
  constructor(file: string, problem: string) {
    super('rule_file_invalid', `${file}: ${problem}`, { file, problem });
  }
}

/** Issues of a zod error as { path, message } with paths like "loads[3].hp". */
export function zodIssues(issues: ReadonlyArray<{ path: ReadonlyArray<PropertyKey>; message: string }>): FieldIssue[] {
  return issues.map((i) => ({
    path: i.path.reduce<string>(
      (acc, seg) => (typeof seg === 'number' ? `${acc}[${seg}]` : acc ? `${acc}.${String(seg)}` : String(seg)),
      '',
    ),
    message: i.message,
  }));
}
