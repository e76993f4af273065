import crypto from 'node:crypto';
import type { Transaction } from 'sequelize';
import { OutboxMessage, type StoredAttachment } from '../../db/models/index.js';

export interface MailInput {
  kind: string;
  to: string;
  subject: string;
  text: string;
  html?: string;
  attachments?: StoredAttachment[];
  /** A key that makes the same mail be queued at most once (e.g. "confirmation:<order id>"). */
  dedupeKey?: string;
  /** Extra header lines (e.g. List-Unsubscribe, RFC 8058). */
  headers?: Record<string, string>;
  /** Not sent before this time: spreads a large mailing out (throttling). */
  notBefore?: Date;
}

/**
 * Queues an e-mail in the outbox, inside the caller's transaction, so the mail
 * exists exactly when the change that causes it commits. The relay sends it.
 * The Message-ID is fixed at queue time, so a retried send is recognisable.
 */
export async function enqueueMail(mail: MailInput, transaction: Transaction): Promise<void> {
  const id = crypto.randomUUID();
  await OutboxMessage.findOrCreate({
    where: { dedupeKey: mail.dedupeKey ?? id },
    defaults: {
      id,
      messageId: `<${mail.kind}.${id}@fryline.local>`,
      dedupeKey: mail.dedupeKey ?? id,
      kind: mail.kind,
      toAddress: mail.to,
      subject: mail.subject,
      textBody: mail.text,
      htmlBody: mail.html ?? null,
      attachments: mail.attachments ?? [],
      headers: mail.headers ?? {},
      ...(mail.notBefore ? { nextAttemptAt: mail.notBefore } : {}),
    },
    transaction,
  });
}
