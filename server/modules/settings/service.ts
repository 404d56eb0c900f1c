import type { CurrentUser } from '../../../shared/schemas/auth';
import { LOGO_MAX_BYTES, type ShopSettings, type ShopSettingsUpdate } from '../../../shared/schemas/settings';
import { ConflictError, NotFoundError, ValidationError } from '../../../shared/errors';
import { recordActivity } from '../activity/service';
import { fileStore, type StoredFile } from './storage';
import * as repo from './repository';
import type { Organisation } from '../../db/models/organisation';

const LOGO_KEY = 'logo';

async function requireOrganisation(id: number): Promise<Organisation> {
  const o = await repo.findOrganisation(id);
  if (!o) throw new NotFoundError('The shop');
  return o;
}

async function view(o: Organisation): Promise<ShopSettings> {
  const logo = o.logoKey ? await fileStore().head(o.id, o.logoKey) : null;
  return {
    name: o.name,
    address: o.address,
    defaultLabourRate: o.defaultLabourRate,
    defaultMarkupPercent: o.defaultMarkupPercent,
    drawingNumberScheme: o.drawingNumberScheme,
    allowSelfSignOff: o.allowSelfSignOff,
    logo: logo ? { contentType: logo.contentType, bytes: logo.bytes, updatedAt: logo.updatedAt.toISOString() } : null,
    version: o.version,
    updatedAt: o.updatedAt.toISOString(),
  };
}

/** The shop's settings as every module reads them (the submittal, the nameplate, new panels, the sign-off rule). */
export async function shopSettingsOf(organisationId: number): Promise<ShopSettings> {
  return view(await requireOrganisation(organisationId));
}

export async function getSettings(actor: CurrentUser) {
  return shopSettingsOf(actor.organisationId);
}

const STALE = 'Someone else changed the shop settings since you opened them: reload to see their change, then apply yours again';

export async function updateSettings(actor: CurrentUser, input: ShopSettingsUpdate) {
  const { version, ...values } = input;
  const before = await requireOrganisation(actor.organisationId);
  const count = await repo.updateSettings(actor.organisationId, version, values);
  if (count === 0) throw new ConflictError(STALE);
  const changed = (Object.keys(values) as Array<keyof typeof values>).filter((k) => before[k] !== values[k]);
  const diff = Object.fromEntries(changed.map((k) => [k, { from: before[k], to: values[k] }]));
  await recordActivity(actor, {
    entity: 'organisation',
    entityId: actor.organisationId,
    action: 'settings',
    summary: `Changed the shop settings: ${changed.join(', ') || 'nothing'}`,
    diff,
  });
  return shopSettingsOf(actor.organisationId);
}

/** The content type a file's first bytes show: PNG or JPEG, or null (the browser's word is not trusted). */
export function imageTypeOf(data: Buffer): 'image/png' | 'image/jpeg' | null {
  if (data.length >= 8 && data.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))) return 'image/png';
  if (data.length >= 3 && data[0] === 0xff && data[1] === 0xd8 && data[2] === 0xff) return 'image/jpeg';
  return null;
}

export async function putLogo(actor: CurrentUser, version: number, file: { buffer: Buffer; originalname: string } | undefined) {
  if (!file) throw new ValidationError('Choose a PNG or JPEG file for the logo', [{ path: 'file', message: 'no file' }]);
  if (file.buffer.length > LOGO_MAX_BYTES)
    throw new ValidationError(`The logo is larger than ${LOGO_MAX_BYTES / 1024} KB: use a smaller image`, [
      { path: 'file', message: 'too large' },
    ]);
  const type = imageTypeOf(file.buffer);
  if (!type)
    throw new ValidationError(`${file.originalname || 'The file'} is not a PNG or JPEG image`, [
      { path: 'file', message: 'PNG or JPEG only' },
    ]);
  const o = await requireOrganisation(actor.organisationId);
  if (o.version !== version) throw new ConflictError(STALE);
  await fileStore().put(o.id, LOGO_KEY, type, file.buffer);
  const count = await repo.updateSettings(o.id, version, { logoKey: LOGO_KEY });
  if (count === 0) throw new ConflictError(STALE);
  await recordActivity(actor, {
    entity: 'organisation',
    entityId: o.id,
    action: 'logo',
    summary: `Uploaded the shop logo (${type}, ${Math.ceil(file.buffer.length / 1024)} KB)`,
  });
  return shopSettingsOf(o.id);
}

export async function deleteLogo(actor: CurrentUser, version: number) {
  const o = await requireOrganisation(actor.organisationId);
  const count = await repo.updateSettings(o.id, version, { logoKey: null });
  if (count === 0) throw new ConflictError(STALE);
  if (o.logoKey) await fileStore().delete(o.id, o.logoKey);
  await recordActivity(actor, { entity: 'organisation', entityId: o.id, action: 'logo', summary: 'Removed the shop logo' });
  return shopSettingsOf(o.id);
}

/** The logo's bytes, or null when the shop has none. */
export async function logoOf(organisationId: number): Promise<StoredFile | null> {
  const o = await requireOrganisation(organisationId);
  return o.logoKey ? fileStore().get(o.id, o.logoKey) : null;
}
