// Sessions kept per process in front of the PostgreSQL session store. Every signed-in request reads
// its session; a repeated read is answered from memory while the change feed is live. Another
// instance's sign-out or session change reaches this process as a notification (the session named
// by the md5 of its id) and drops the entry; a lost feed drops them all and reads go to the database.
import { createHash } from 'node:crypto';
import session from 'express-session';
import type { SessionData } from 'express-session';
import type { ChangeFeed } from '../db/change-feed';

const KINDS = ['s'] as const;
const MAX_ENTRIES = 20_000;

function digest(sid: string): string {
  return createHash('md5').update(sid).digest('hex');
}

function expiry(sess: SessionData): number {
  const e = sess.cookie?.expires;
  return e ? new Date(e).getTime() : Number.POSITIVE_INFINITY;
}

type Callback = (err?: unknown) => void;

export class CachedSessionStore extends session.Store {
  private readonly entries = new Map<string, { json: string; expires: number }>();

  constructor(
    private readonly inner: session.Store,
    private readonly feed: ChangeFeed,
  ) {
    super();
    feed.onChange((kind, key) => {
      if (kind === 's') this.entries.delete(key);
    });
    feed.onReset(() => this.entries.clear());
    inner.on('connect', () => this.emit('connect'));
    inner.on('disconnect', () => this.emit('disconnect'));
  }

  /** entries held (for tests) */
  get size(): number {
    return this.entries.size;
  }

  private remember(key: string, sess: SessionData) {
    if (this.entries.size >= MAX_ENTRIES) this.entries.clear();
    this.entries.set(key, { json: JSON.stringify(sess), expires: expiry(sess) });
  }

  override get(sid: string, cb: (err: unknown, sess?: SessionData | null) => void): void {
    const key = digest(sid);
    const hit = this.entries.get(key);
    if (hit && this.feed.live) {
      if (hit.expires > Date.now()) {
        cb(null, JSON.parse(hit.json) as SessionData);
        return;
      }
      this.entries.delete(key);
    }
    // A notification that arrives while the database answers may concern this very session: then
    // the answer is used once but not kept.
    const token = this.feed.token(KINDS);
    this.inner.get(sid, (err, sess) => {
      if (!err && sess && this.feed.isCurrent(token, KINDS)) this.remember(key, sess);
      cb(err, sess);
    });
  }

  override set(sid: string, sess: SessionData, cb?: Callback): void {
    const key = digest(sid);
    this.entries.delete(key);
    const token = this.feed.token(KINDS);
    this.inner.set(sid, sess, (err?: unknown) => {
      if (!err && this.feed.isCurrent(token, KINDS)) this.remember(key, sess);
      cb?.(err);
    });
  }

  override destroy(sid: string, cb?: Callback): void {
    this.entries.delete(digest(sid));
    this.inner.destroy(sid, (err?: unknown) => {
      this.entries.delete(digest(sid));
      cb?.(err);
    });
  }

  override touch(sid: string, sess: SessionData, cb?: () => void): void {
    if (this.inner.touch) this.inner.touch(sid, sess, cb);
    else cb?.();
  }
}
