import { randomBytes } from 'node:crypto';
import argon2 from 'argon2';
import type { CurrentUser, UserCreate, UserUpdate } from '../../../shared/schemas/auth';
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from '../../../shared/errors';
import * as repo from './repository';
import { sendMail } from '../mail/mailer';
import { env } from '../../config/env';
import { recordActivity } from '../activity/service';

export async function listUsers(actor: CurrentUser) {
  return repo.listUsers(actor.organisationId);
}

export async function inviteUser(actor: CurrentUser, input: UserCreate) {
  if (await repo.findUserByEmail(input.email)) {
    throw new ValidationError('That e-mail address already has an account', [{ path: 'body.email', message: 'already in use' }]);
  }
  const inviteToken = randomBytes(24).toString('base64url');
  const user = await repo.createUser({
    organisationId: actor.organisationId,
    email: input.email,
    name: input.name,
    roles: input.roles,
    inviteToken,
  });
  await recordActivity(actor, {
    entity: 'user',
    entityId: user.id,
    action: 'invited',
    summary: `Invited ${input.name} <${input.email}> as ${input.roles.join(', ')}`,
  });
  await sendMail(
    [input.email],
    `You are invited to Panelwright by ${actor.organisationName}`,
    `${actor.name} invited you to Panelwright.\n\nSet your password here: ${env().APP_URL}/invite/${inviteToken}\n`,
  );
  return { ...repo.publicUser(user), inviteLink: `/invite/${inviteToken}` };
}

export async function updateUser(actor: CurrentUser, id: number, input: UserUpdate) {
  const user = await repo.findUserInOrganisation(actor.organisationId, id);
  if (!user) throw new NotFoundError('User');
  const { version, ...changes } = input;
  const losesAdmin = (changes.roles && !changes.roles.includes('admin')) || changes.active === false;
  if (user.roles.includes('admin') && losesAdmin && (await repo.countAdmins(actor.organisationId)) <= 1) {
    throw new ForbiddenError('The organisation must keep at least one active administrator');
  }
  const count = await repo.updateUserVersioned(actor.organisationId, id, version, changes);
  if (count === 0) throw new ConflictError('Someone else changed this user since you opened it: reload and apply your change again');
  await recordActivity(actor, { entity: 'user', entityId: id, action: 'updated', summary: `Changed ${user.name}`, diff: changes });
  const fresh = await repo.findUserInOrganisation(actor.organisationId, id);
  return repo.publicUser(fresh!);
}

export async function acceptInvite(token: string, password: string) {
  const user = await repo.findByInviteToken(token);
  if (!user) throw new NotFoundError('Invitation');
  await repo.setPassword(user.id, await argon2.hash(password));
  return { email: user.email };
}
