// The development mail fake, like the project's database, passes over a port another program holds
// and the app sends to the port it really got: a held PW_SMTP_FAKE_PORT loses no mail.
import net from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { SMTPServer } from 'smtp-server';
import { Op } from 'sequelize';
import { testApp } from '../setup/api';
import { fakeSmtpPortOf, startFakeSmtp } from '../../server/modules/mail/fake-smtp';
import { resetMailer, sendMail } from '../../server/modules/mail/mailer';
import { resetEnvCache } from '../../server/config/env';
import { MailMessage } from '../../server/db/models/mail-message';

describe('the development mail fake on a held port', () => {
  let holder: net.Server;
  let held = 0;
  let smtp: SMTPServer | null = null;
  const received: Buffer[] = [];

  beforeAll(async () => {
    testApp(); // the database connection the fake stores its messages through
    // "another program" on the fake's port: a plain TCP listener that would swallow any mail sent to it
    holder = net.createServer((socket) => socket.on('data', (d) => received.push(d)));
    await new Promise<void>((resolve) => holder.listen(0, '127.0.0.1', () => resolve()));
    held = (holder.address() as net.AddressInfo).port;
    process.env.PW_SMTP_FAKE_PORT = String(held);
    resetEnvCache();
    resetMailer();
  });
  afterAll(async () => {
    if (smtp) await new Promise<void>((resolve) => smtp!.close(() => resolve()));
    await new Promise<void>((resolve) => holder.close(() => resolve()));
    delete process.env.PW_SMTP_FAKE_PORT;
    resetEnvCache();
  });

  it('refuses a held port asked for explicitly, naming the variable', async () => {
    await expect(startFakeSmtp(held, { explicit: 'PW_SMTP_FAKE_PORT' })).rejects.toThrow(
      `Port ${held} (PW_SMTP_FAKE_PORT) is held by another program`,
    );
  });

  it('otherwise takes the next free port, and the mail sent reaches the Outbox', async () => {
    smtp = await startFakeSmtp(held);
    const port = fakeSmtpPortOf(smtp);
    expect(port).toBeGreaterThan(held);
    const subject = `Port check ${Date.now().toString(36)}`;
    await sendMail(['engineer@copperline.test'], subject, 'A message sent while another program held the usual port.');
    let stored: MailMessage | null = null;
    for (let i = 0; i < 50 && !stored; i++) {
      stored = await MailMessage.findOne({ where: { subject: { [Op.eq]: subject } } });
      if (!stored) await new Promise((r) => setTimeout(r, 100));
    }
    expect(stored?.toAddress).toContain('engineer@copperline.test');
    expect(Buffer.concat(received).toString()).not.toContain(subject); // nothing went to the other program
  });
});
