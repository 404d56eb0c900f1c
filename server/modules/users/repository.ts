import { Op, QueryTypes } from 'sequelize';
import { db } from '../../db/sequelize';
import { FeedCache } from '../../db/change-feed';
import { User } from '../../db/models/user';
import { Organisation } from '../../db/models/organisation';

export interface UserRow {
  id: number;
  organisationId: number;
  organisationName: string;
  email: string;
  name: string;
  roles: string[];
  active: boolean;
  passwordHash: string | null;
}

export async function findUserByEmail(email: string) {
  return User.findOne({ where: { email } });
}

/**
 * The signed-in user of a request, kept per process: every signed-in request needs it. An entry is
 * served only while the change feed is live and no user row has changed since it was read (any
 * instance's change arrives as a notification); a change through this process forgets it at once.
 */
const signedInUsers = new FeedCache<number, UserRow | null>(['u']);

export function forgetUser(id: number) {
  signedInUsers.forget(id);
}

export async function findSignedInUser(id: number): Promise<UserRow | null> {
  return signedInUsers.get(id, () => findUserById(id));
}

/** One query: the user with the organisation's name. */
export async function findUserById(id: number): Promise<UserRow | null> {
  const rows = await db().query<UserRow>(
    `select u.id, u.organisation_id as "organisationId", o.name as "organisationName", u.email, u.name, u.roles, u.active, null as "passwordHash"
       from users u join organisations o on o.id = u.organisation_id where u.id = :id`,
    { replacements: { id }, type: QueryTypes.SELECT },
  );
  return rows[0] ?? null;
}

export async function markSignedIn(id: number) {
  await User.update({ lastSignInAt: new Date() }, { where: { id } });
}

/** The public view of a user: never the hash or the invite token. */
export function publicUser(u: User) {
  return {
    id: u.id,
    email: u.email,
    name: u.name,
    roles: u.roles,
    active: u.active,
    invited: !u.passwordHash,
    lastSignInAt: u.lastSignInAt,
    version: u.version,
  };
}

export async function listUsers(organisationId: number) {
  const rows = await User.findAll({ where: { organisationId }, order: [['name', 'ASC']] });
  return rows.map(publicUser);
}

export async function createUser(values: {
  organisationId: number;
  email: string;
  name: string;
  roles: string[];
  passwordHash?: string | null;
  inviteToken?: string | null;
}) {
  return User.create({
    organisationId: values.organisationId,
    email: values.email,
    name: values.name,
    roles: values.roles,
    passwordHash: values.passwordHash ?? null,
    inviteToken: values.inviteToken ?? null,
    lastSignInAt: null,
  });
}

export async function findUserInOrganisation(organisationId: number, id: number) {
  return User.findOne({ where: { organisationId, id } });
}

export async function updateUserVersioned(
  organisationId: number,
  id: number,
  version: number,
  values: Partial<{ name: string; roles: string[]; active: boolean }>,
) {
  const [count] = await User.update({ ...values, version: version + 1 }, { where: { organisationId, id, version } });
  forgetUser(id);
  return count;
}

export async function findByInviteToken(token: string) {
  return User.findOne({ where: { inviteToken: token, passwordHash: { [Op.is]: null } } });
}

export async function setPassword(id: number, passwordHash: string) {
  await User.update({ passwordHash, inviteToken: null }, { where: { id } });
  forgetUser(id);
}

export async function countAdmins(organisationId: number) {
  return User.count({ where: { organisationId, active: true, roles: { [Op.contains]: ['admin'] } } });
}

export async function findOrganisation(id: number) {
  return Organisation.findByPk(id);
}
