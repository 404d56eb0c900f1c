// The development and test stand-in for a mail server: an SMTP server on loopback that keeps every
// message it receives in the Outbox table, where admins read them in the app.
import { SMTPServer } from 'smtp-server';
import { simpleParser } from 'mailparser';
import { storeMessage } from './repository';

export function startFakeSmtp(port: number): Promise<SMTPServer> {
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
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve(server));
  });
}
