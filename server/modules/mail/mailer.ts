import nodemailer, { type Transporter } from 'nodemailer';
import { env } from '../../config/env';

let transporter: Transporter | null = null;
/** the port the local fake really listens on, once started in this process (PW_SMTP_FAKE_PORT may have been held) */
let fakePort: number | null = null;

/** Sends to the fake on this port from now on. */
export function sendThroughFakeSmtpPort(port: number) {
  fakePort = port;
  transporter = null;
}

/** SMTP_URL in production; the local fake (smtp://127.0.0.1:<its port>) otherwise. */
function transport(): Transporter {
  if (!transporter) {
    const e = env();
    const url = e.SMTP_URL ?? `smtp://127.0.0.1:${fakePort ?? e.PW_SMTP_FAKE_PORT}`;
    transporter = nodemailer.createTransport(url);
  }
  return transporter;
}

export function resetMailer() {
  transporter = null;
}

export async function sendMail(to: string[], subject: string, text: string) {
  if (to.length === 0) return;
  try {
    await transport().sendMail({ from: env().MAIL_FROM, to, subject, text });
  } catch (err) {
    // Mail is a notification: a failed send is logged, never a failed request.
    console.error('[mail] not sent:', err instanceof Error ? err.message : err);
  }
}
