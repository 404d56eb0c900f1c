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
  /** true while the LISTEN connection is up */
  live = false;
  /** notifications received since start (for tests and diagnostics) */
  received = 0;

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
    const client = new pg.Client({ connectionString: this.url, application_name: 'panelwright-change-feed', keepAlive: true, keepAliveInitialDelayMillis: 10_000 });
    client.on('notification', (msg) => {
      if (msg.channel !== CHANNEL || !msg.payload) return;
      this.received++;
      const kind = msg.payload[0] as ChangeKind;
      const key = msg.payload.slice(2);
      if (kind in this.counters) this.counters[kind]++;
      for (const l of this.listeners) l(kind, key);
    });
    const onDown = () => {
      if (this.client !== client) return;
      this.client = null;
      this.lost();
      this.scheduleRetry();
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
      this.retryMs = 250;
      this.generation++; // whatever was cached before this connection may have missed a change
      this.live = true;
    } catch {
      await client.end().catch(() => undefined);
      this.scheduleRetry();
    }
  }

  private lost() {
    this.live = false;
    this.generation++;
    for (const l of this.listeners) l('s', '*');
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

  /** Called for every notification (key '*' after a lost connection: forget everything). */
  onChange(l: Listener): () => void {
    this.listeners.add(l);
    return () => this.listeners.delete(l);
  }
}

let feed: ChangeFeed | null = null;

/** The process's change feed (started by createApp). */
export function changeFeed(): ChangeFeed {
  feed ??= new ChangeFeed();
  return feed;
}
