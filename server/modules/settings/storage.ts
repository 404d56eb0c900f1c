// Where uploaded files live (today the shop's logo). The default keeps them in PostgreSQL, so a second
// instance sees them at once; object storage can stand in by implementing the same four calls.
import { db } from '../../db/sequelize';
import { StoredFileRow } from '../../db/models/stored-file';

export interface StoredFile {
  contentType: string;
  data: Buffer;
  bytes: number;
  updatedAt: Date;
}

export interface FileStore {
  put(organisationId: number, key: string, contentType: string, data: Buffer): Promise<void>;
  get(organisationId: number, key: string): Promise<StoredFile | null>;
  /** size and type without the content */
  head(organisationId: number, key: string): Promise<Omit<StoredFile, 'data'> | null>;
  delete(organisationId: number, key: string): Promise<void>;
}

/** The default file store: one row per file in `stored_files` (bytea). */
export class PostgresFileStore implements FileStore {
  async put(organisationId: number, key: string, contentType: string, data: Buffer) {
    await db().query(
      `insert into stored_files (organisation_id, key, content_type, bytes, data, created_at, updated_at) values (:organisationId, :key, :contentType, :bytes, :data, now(), now())
         on conflict (organisation_id, key) do update set content_type = excluded.content_type, bytes = excluded.bytes, data = excluded.data, updated_at = now()`,
      { replacements: { organisationId, key, contentType, bytes: data.length, data } },
    );
  }

  async get(organisationId: number, key: string) {
    const r = await StoredFileRow.findOne({ where: { organisationId, key } });
    return r ? { contentType: r.contentType, data: r.data, bytes: r.bytes, updatedAt: r.updatedAt } : null;
  }

  async head(organisationId: number, key: string) {
    const r = await StoredFileRow.findOne({ where: { organisationId, key }, attributes: ['contentType', 'bytes', 'updatedAt'] });
    return r ? { contentType: r.contentType, bytes: r.bytes, updatedAt: r.updatedAt } : null;
  }

  async delete(organisationId: number, key: string) {
    await StoredFileRow.destroy({ where: { organisationId, key } });
  }
}

let store: FileStore = new PostgresFileStore();

export function fileStore(): FileStore {
  return store;
}

/** Replace the file store (object storage in a larger installation). */
export function setFileStore(s: FileStore) {
  store = s;
}
