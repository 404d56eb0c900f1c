// The change feed: one LISTEN connection per server process. Triggers (migration 0004) send a
// notification on channel pw_change whenever a session, user, job or panel row changes, from any
// server instance or script. Per-process caches use it to answer repeated reads without asking the
// database each time, and still see another instance's change as soon as PostgreSQL delivers it.
//
// The rule every cache follows: an entry is "verified" under a token taken before its read; it may
// be served without a query only while the feed is live and that token is still current. The token
// moves on any notification of the kinds the cache depends on, on every state-changing request of
// this process (before it runs and again before its answer is sent), and on any loss of the
// connection (notifications may have been missed). While the feed is down, caches ask the database.
// The connection proves that it hears before it is trusted, and again every 15 s: it sends a
// notification of its own ("h:<nonce>") and must receive it within 5 s, or it is dropped.
import { randomBytes } from 'node:crypto';
import pg from 'pg';

/** s: session (payload md5 of its id), u: user, j: job, p: panel, c: catalogue (payload *) */
export type ChangeKind = 's' | 'u' | 'j' | 'p' | 'c';
type Listener = (kind: ChangeKind, key: string) => void;

const CHANNEL = 'pw_change';

export class ChangeFeed {
  private client: pg.Client | null = null;
  private url: string | null = null;
  private stopped = true;
  private retryTimer: NodeJS.Timeout | null = null;
  private retryMs = 250;
  private readonly counters: Record<ChangeKind, number> = { s: 0, u: 0, j: 0, p: 0, c: 0 };
  private generation = 0;
  private readonly listeners = new Set<Listener>();
  private readonly resetListeners = new Set<() => void>();
  /** true while the LISTEN connection is up */
  live = false;
  /** notifications received since start (for tests and diagnostics) */
  received = 0;
  private heartbeat = { everyMs: 15_000, timeoutMs: 5_000 };
  private beatTimer: NodeJS.Timeout | null = null;
  private beatNonce: string | null = null;
  private beatHeard: (() => void) | null = null;

  /** Connects and listens; resolves once listening (or once the first attempt failed: it retries). */
  async start(url: string): Promise<void> {
    if (!this.stopped && this.url === url) return;
    if (!this.stopped) await this.stop(); // another database: its notifications are the ones that count
    this.url = url;
    this.stopped = false;
    await this.connect();
  }

  async stop(): Promise<void> {
    this.stopped = true;
    if (this.retryTimer) clearTimeout(this.retryTimer);
    this.retryTimer = null;
    const c = this.client;
    this.client = null;
    this.lost();
    if (c) await c.end().catch(() => undefined);
  }

  private async connect(): Promise<void> {
    if (this.stopped || !this.url) return;
    // TCP keepalive: a connection silently dropped on the way (a firewall's idle timeout) ends with an
    // error instead of leaving the feed deaf while it believes itself live
    const client = new pg.Client({
      connectionString: this.url,
      application_name: 'panelwright-change-feed',
      keepAlive: true,
      keepAliveInitialDelayMillis: 10_000,
    });
    client.on('notification', (msg) => {
      if (msg.channel !== CHANNEL || !msg.payload) return;
      this.received++;
      const kind = msg.payload[0];
      const key = msg.payload.slice(2);
      if (kind === 'h') {
        if (key === this.beatNonce) this.beatHeard?.();
        return;
      }
      if (!(kind in this.counters)) return;
      this.counters[kind as ChangeKind]++;
      for (const l of this.listeners) l(kind as ChangeKind, key);
    });
    const onDown = () => {
      if (this.client !== client) return;
      this.drop(client);
    };
    client.on('error', onDown);
    client.on('end', onDown);
    try {
      await client.connect();
      await client.query(`LISTEN ${CHANNEL}`);
      if (this.stopped) {
        await client.end().catch(() => undefined);
        return;
      }
      this.client = client;
      // live only once a notification of our own has come back on this connection: a connection that
      // cannot hear (a pooler that does not pass LISTEN through) never serves a cache
      if (!(await this.beat(client))) {
        if (this.client === client) this.drop(client);
        return;
      }
      this.retryMs = 250;
      this.generation++; // whatever was cached before this connection may have missed a change
      this.live = true;
      this.beatTimer = setInterval(() => {
        void this.beat(client).then((heard) => {
          if (!heard && this.client === client) this.drop(client);
        });
      }, this.heartbeat.everyMs);
      this.beatTimer.unref();
    } catch {
      if (this.client === client) this.client = null;
      await client.end().catch(() => undefined);
      this.scheduleRetry();
    }
  }

  /** Sends a notification through the connection and waits for it to come back. */
  private beat(client: pg.Client): Promise<boolean> {
    const nonce = randomBytes(8).toString('hex');
    this.beatNonce = nonce;
    return new Promise<boolean>((resolve) => {
      const timer = setTimeout(() => done(false), this.heartbeat.timeoutMs);
      timer.unref();
      const done = (heard: boolean) => {
        clearTimeout(timer);
        if (this.beatNonce === nonce) {
          this.beatNonce = null;
          this.beatHeard = null;
        }
        resolve(heard);
      };
      this.beatHeard = () => done(true);
      client.query('select pg_notify($1, $2)', [CHANNEL, `h:${nonce}`]).catch(() => done(false));
    });
  }

  /** The connection can no longer be trusted: forget everything, close it, connect again later. */
  private drop(client: pg.Client) {
    this.client = null;
    this.lost();
    void client.end().catch(() => undefined);
    this.scheduleRetry();
  }

  private lost() {
    this.live = false;
    this.generation++;
    if (this.beatTimer) clearInterval(this.beatTimer);
    this.beatTimer = null;
    for (const r of this.resetListeners) r();
  }

  /** How often the connection proves it still hears, and how long an answer may take (tests shorten both). */
  setHeartbeat(everyMs: number, timeoutMs: number) {
    this.heartbeat = { everyMs, timeoutMs };
  }

  private scheduleRetry() {
    if (this.stopped || this.retryTimer) return;
    this.retryTimer = setTimeout(() => {
      this.retryTimer = null;
      void this.connect();
    }, this.retryMs);
    this.retryTimer.unref();
    this.retryMs = Math.min(this.retryMs * 2, 5000);
  }

  /** A state-changing request of this process starts or answers: nothing verified before stays verified. */
  localWrite() {
    this.generation++;
  }

  /**
   * A token for the given kinds: take it before the read, keep it with the entry, and serve the
   * entry only while isCurrent(token). null while the feed is down (nothing may be served unasked).
   */
  token(kinds: readonly ChangeKind[]): number | null {
    if (!this.live) return null;
    let t = this.generation * 1_000_003;
    for (const k of kinds) t += this.counters[k];
    return t;
  }

  isCurrent(token: number | null, kinds: readonly ChangeKind[]): boolean {
    return token !== null && token === this.token(kinds);
  }

  /** Called for every notification of a change. */
  onChange(l: Listener): () => void {
    this.listeners.add(l);
    return () => this.listeners.delete(l);
  }

  /** Called when the connection is lost: notifications may have been missed, so forget everything. */
  onReset(r: () => void): () => void {
    this.resetListeners.add(r);
    return () => this.resetListeners.delete(r);
  }
}

/**
 * A per-process cache that follows the change feed: an entry read under a token is served without a
 * query only while that token is current for the given kinds (see the header of this file).
 */
export class FeedCache<K, V> {
  private readonly entries = new Map<K, { token: number | null; value: V }>();

  constructor(
    private readonly kinds: readonly ChangeKind[],
    private readonly maxEntries = 10_000,
  ) {}

  async get(key: K, load: () => Promise<V>): Promise<V> {
    const feed = changeFeed();
    const hit = this.entries.get(key);
    if (hit && feed.isCurrent(hit.token, this.kinds)) return hit.value;
    const token = feed.token(this.kinds);
    const value = await load();
    if (this.entries.size >= this.maxEntries) this.entries.clear();
    this.entries.set(key, { token, value });
    return value;
  }

  /** A change made through this process, known before its notification arrives. */
  forget(key: K) {
    this.entries.delete(key);
  }
}

let feed: ChangeFeed | null = null;

/** The process's change feed (started by createApp). */
export function changeFeed(): ChangeFeed {
  feed ??= new ChangeFeed();
  return feed;
}
