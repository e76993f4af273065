import type { Transporter } from 'nodemailer';
import { QueryTypes, type Sequelize } from 'sequelize';

interface DueRow {
  id: string;
  message_id: string;
  to_address: string;
  subject: string;
  text_body: string;
  html_body: string | null;
  attachments: Array<{ filename: string; contentType: string; content: string; cid?: string }>;
  headers: Record<string, string> | null;
  attempts: number;
}

/** Seconds to wait before the next try: 2, 4, 8 … capped at 5 minutes. */
export function backoffSeconds(attempts: number): number {
  return Math.min(2 ** attempts, 300);
}

/**
 * Sends what is due in the outbox. Rows are claimed with FOR UPDATE SKIP
 * LOCKED, so several API processes can relay side by side without sending a
 * message twice. A failed send stays pending and is retried with backoff;
 * only a permanent refusal by the server (5xx) after several tries is given up.
 */
export async function relayOutbox(sequelize: Sequelize, transport: Transporter, from: string, batch = 20): Promise<{ sent: number; failed: number }> {
  let sent = 0;
  let failed = 0;
  await sequelize.transaction(async (transaction) => {
    const rows = await sequelize.query<DueRow>(
      `SELECT id, message_id, to_address, subject, text_body, html_body, attachments, headers, attempts
         FROM outbox
        WHERE status = 'pending' AND next_attempt_at <= now()
        ORDER BY created_at
        LIMIT :batch
        FOR UPDATE SKIP LOCKED`,
      { replacements: { batch }, type: QueryTypes.SELECT, transaction },
    );
    for (const row of rows) {
      try {
        await transport.sendMail({
          from,
          to: row.to_address,
          subject: row.subject,
          text: row.text_body,
          html: row.html_body ?? undefined,
          messageId: row.message_id,
          headers: row.headers ?? {},
          attachments: row.attachments.map((a) => ({
            filename: a.filename,
            contentType: a.contentType,
            content: Buffer.from(a.content, 'base64'),
            cid: a.cid,
          })),
        });
        await sequelize.query(`UPDATE outbox SET status = 'sent', sent_at = now(), attempts = attempts + 1, last_error = NULL WHERE id = :id`, {
          replacements: { id: row.id },
          transaction,
        });
        sent += 1;
      } catch (err) {
        const attempts = row.attempts + 1;
        const code = (err as { responseCode?: number }).responseCode ?? 0;
        const permanent = code >= 500 && attempts >= 5;
        await sequelize.query(
          `UPDATE outbox SET attempts = :attempts, last_error = :error, status = :status,
                  next_attempt_at = now() + make_interval(secs => :delay)
            WHERE id = :id`,
          {
            replacements: {
              id: row.id,
              attempts,
              error: String((err as Error).message).slice(0, 500),
              status: permanent ? 'failed' : 'pending',
              delay: backoffSeconds(attempts),
            },
            transaction,
          },
        );
        failed += 1;
      }
    }
  });
  return { sent, failed };
}
