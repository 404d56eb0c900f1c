// APP_URL (the address in e-mail links) defaults to the address the server listens on.
import os from 'node:os';
import { afterEach, describe, expect, it } from 'vitest';
import { env, listenUrl, resetEnvCache } from '../../server/config/env';

const saved = { HOST: process.env.HOST, PORT: process.env.PORT, APP_URL: process.env.APP_URL };
afterEach(() => {
  for (const [k, v] of Object.entries(saved)) {
    if (v === undefined) delete process.env[k];
    else process.env[k] = v;
  }
  resetEnvCache();
});

describe('APP_URL', () => {
  it.each([
    // [HOST, PORT, APP_URL expected]
    [undefined, undefined, 'http://127.0.0.1:3000'], // README § Configuration defaults
    ['127.0.0.1', '8080', 'http://127.0.0.1:8080'],
    ['panels.shop.test', '3100', 'http://panels.shop.test:3100'],
    ['::1', '3000', 'http://[::1]:3000'], // RFC 3986 §3.2.2: an IPv6 literal in brackets
    ['0.0.0.0', '3000', `http://${os.hostname()}:3000`], // every interface: the machine's name
  ])('HOST %s, PORT %s gives %s', (host, port, url) => {
    delete process.env.APP_URL;
    if (host === undefined) delete process.env.HOST;
    else process.env.HOST = host;
    if (port === undefined) delete process.env.PORT;
    else process.env.PORT = port;
    resetEnvCache();
    expect(env().APP_URL).toBe(url);
  });

  it('keeps an APP_URL that is set', () => {
    process.env.PORT = '8080';
    process.env.APP_URL = 'https://panels.shop.test';
    resetEnvCache();
    expect(env().APP_URL).toBe('https://panels.shop.test');
    expect(listenUrl('10.0.0.5', 8080)).toBe('http://10.0.0.5:8080');
  });
});
