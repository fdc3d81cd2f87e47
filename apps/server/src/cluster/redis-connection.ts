import { createClient } from 'redis';

/** Reconnects by itself, backing off to 2 s. */
const connectTo = (url: string, name?: string) =>
  createClient({ url, name, socket: { reconnectStrategy: (retries: number) => Math.min(100 * 2 ** retries, 2000), connectTimeout: 5000 } });

/** How long the start waits for Redis before it gives up, naming REDIS_URL. */
const START_TIMEOUT_MS = 10_000;

export type RedisClient = ReturnType<typeof connectTo>;

/** The Redis connections of one instance: one for commands and PUBLISH, one subscribed. */
export interface RedisConnection {
  /** Prefix of every key and channel this instance uses (REDIS_PREFIX). */
  prefix: string;
  client: RedisClient;
  /** In subscriber mode (it takes SUBSCRIBE/UNSUBSCRIBE only). */
  subscriber: RedisClient;
  /** Listeners called each time the subscriber is ready again after losing its connection (resubscribed by then). */
  onResubscribed(listener: () => void): void;
  close(): Promise<void>;
}

/**
 * Connects to REDIS_URL. Both connections reconnect on their own (backing off to 2 s) and queue
 * commands meanwhile, so a PUBLISH during a Redis restart is sent late, not lost; node-redis
 * resubscribes before it reports the subscriber ready again. No answer within 10 s at the start stops the start.
 */
export async function openRedis(url: string, log: (line: string) => void, options: { prefix?: string; name?: string } = {}): Promise<RedisConnection> {
  const prefix = options.prefix ?? 'barwright';
  const name = options.name ?? `${prefix}-${process.pid}`;
  // Named (CLIENT LIST shows them), so an operator, or a test, can tell the connections apart.
  const client = connectTo(url, `${name}-commands`);
  const subscriber = connectTo(url, `${name}-subscriber`);
  const listeners: (() => void)[] = [];
  const watch = (c: RedisClient, name: 'commands' | 'subscriber') => {
    let lost = false;
    // Unheard, an 'error' event would end the process; the client reconnects by itself.
    c.on('error', (error: Error) => {
      if (!lost) log(`redis (${name}): ${error.message}; reconnecting`);
      lost = true;
    });
    c.on('ready', () => {
      if (!lost) return;
      lost = false;
      log(`redis (${name}): connected again`);
      if (name === 'subscriber') for (const l of listeners) l();
    });
  };
  watch(client, 'commands');
  watch(subscriber, 'subscriber');
  const connected = Promise.all([client.connect(), subscriber.connect()]);
  connected.catch(() => {}); // after a timeout below, its rejection is not news
  let timer: NodeJS.Timeout | undefined;
  const late = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(new Error(`Redis at ${new URL(url).host} (REDIS_URL) did not answer within ${START_TIMEOUT_MS / 1000} s`)), START_TIMEOUT_MS);
  });
  try {
    await Promise.race([connected, late]);
  } catch (error) {
    client.destroy();
    subscriber.destroy();
    throw error;
  } finally {
    clearTimeout(timer);
  }
  return {
    prefix,
    client,
    subscriber,
    onResubscribed: (listener) => void listeners.push(listener),
    close: async () => {
      await Promise.all([client.close(), subscriber.close()].map((p) => p.catch(() => {})));
    },
  };
}
