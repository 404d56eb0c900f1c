// The development outbox: mail captured by the fake SMTP server.
import { MailMessage } from '../../db/models/mail-message';

export async function latestMessages(limit: number) {
  return MailMessage.findAll({ order: [['id', 'DESC']], limit });
}

export async function storeMessage(values: { toAddress: string; fromAddress: string; subject: string; body: string }) {
  await MailMessage.create(values);
}
