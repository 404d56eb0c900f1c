// The development and test stand-in for a mail server: an SMTP server on loopback that keeps every
// message it receives in the Outbox table, where admins read them in the app.
import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';
import type { AddressInfo } from 'node:net';
import { choosePort } from '../../config/ports';
import { sendThroughFakeSmtpPort } from './mailer';
import { storeMessage } from './repository';

/**
 * Starts the fake on `port`, or, when another program holds it, on the next free port above it
 * (unless `explicit` names the variable that asked for that very port: then it refuses). The mailer
 * of this process sends to the port it really got; `server.address()` tells it too.
 */
export async function startFakeSmtp(port: number, opts: { explicit?: string | null } = {}): Promise<SMTPServer> {
  const chosen = await choosePort(port, opts.explicit ?? null, 'the development mail server');
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    size: 1024 * 1024,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then(async (parsed) => {
          const to = Array.isArray(parsed.to) ? parsed.to.map((a) => a.text).join(', ') : (parsed.to?.text ?? '');
          await storeMessage({
            toAddress: to,
            fromAddress: parsed.from?.text ?? '',
            subject: parsed.subject ?? '',
            body: parsed.text ?? '',
          });
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(chosen, '127.0.0.1', () => resolve());
  });
  sendThroughFakeSmtpPort(fakeSmtpPortOf(server));
  return server;
}

/** The port a started fake listens on. */
export function fakeSmtpPortOf(server: SMTPServer): number {
  return (server.server.address() as AddressInfo).port;
}
