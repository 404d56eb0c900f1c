import { z } from 'zod';
import { idParamSchema, versionSchema } from './bounds';

export const ROLES = ['admin', 'designer', 'estimator', 'engineer'] as const;
export const RoleSchema = z.enum(ROLES);
export type Role = z.infer<typeof RoleSchema>;

/**
 * Who may do what: one list per role set, used by the server's route table and the client's buttons alike.
 * The order is the order a refusal names them in ("This needs the role admin or estimator").
 */
export const ROLE_SETS = {
  /** every signed-in role: reading jobs, panels, bills of materials, checks; commenting */
  everyone: ROLES,
  /** people, mail outbox */
  admin: ['admin'],
  /** jobs, panels, motors, imports, backups: the panel builder's work */
  design: ['admin', 'designer'],
  /** sign-off decisions */
  engineer: ['engineer'],
  /** catalogue, labour units and prices */
  estimate: ['admin', 'estimator'],
  /** rebuilding a bill of materials from the selections */
  rebuildBom: ['admin', 'estimator', 'designer'],
  /** tested combinations are engineering data: the engineer keeps them too */
  editCombinations: ['admin', 'estimator', 'engineer'],
} as const satisfies Record<string, readonly Role[]>;

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Administrator',
  designer: 'Panel builder',
  estimator: 'Estimator',
  engineer: 'Engineer',
};

/** Password rule: at least 12 characters, not all one character class. */
export const PasswordSchema = z
  .string()
  .min(12, 'Use at least 12 characters')
  .max(200, 'Use at most 200 characters')
  .refine((p) => /[a-zA-Z]/.test(p) && /[^a-zA-Z]/.test(p), 'Mix letters with digits or symbols');

export const SignInSchema = z.object({
  email: z.string().trim().toLowerCase().email('Enter an e-mail address'),
  password: z.string().min(1, 'Enter your password').max(200),
});
export type SignIn = z.infer<typeof SignInSchema>;

export const UserCreateSchema = z.object({
  email: z.string().trim().toLowerCase().email('Enter an e-mail address'),
  name: z.string().trim().min(1, 'Enter a name').max(200),
  roles: z.array(RoleSchema).min(1, 'Give at least one role'),
});
export type UserCreate = z.infer<typeof UserCreateSchema>;

export const UserUpdateSchema = z
  .object({
    name: z.string().trim().min(1).max(200).optional(),
    roles: z.array(RoleSchema).min(1, 'Give at least one role').optional(),
    active: z.boolean().optional(),
    version: versionSchema,
  })
  .strict();
export type UserUpdate = z.infer<typeof UserUpdateSchema>;

export const AcceptInviteSchema = z.object({
  token: z.string().min(10).max(100),
  password: PasswordSchema,
});

export interface CurrentUser {
  id: number;
  organisationId: number;
  organisationName: string;
  email: string;
  name: string;
  roles: Role[];
}

export const IdParamSchema = z.object({ id: idParamSchema });
