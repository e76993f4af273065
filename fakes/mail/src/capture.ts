import { randomUUID } from 'node:crypto';
import { simpleParser, type AddressObject } from 'mailparser';
import type { CapturedMessage } from './store.js';

function addresses(field: AddressObject | AddressObject[] | undefined): { address: string; name: string }[] {
  const objects = field === undefined ? [] : Array.isArray(field) ? field : [field];
  const out: { address: string; name: string }[] = [];
  const walk = (entries: AddressObject['value']) => {
    for (const e of entries) {
      if (e.group) walk(e.group);
      else if (e.address) out.push({ address: e.address, name: e.name });
    }
  };
  for (const o of objects) walk(o.value);
  return out;
}

/** Unfolded header lines by lower-case name. */
function headerMap(lines: ReadonlyArray<{ key: string; line: string }>): Record<string, string> {
  const map: Record<string, string> = {};
  for (const { key, line } of lines) {
    const colon = line.indexOf(':');
    const value = line
      .slice(colon + 1)
      .replace(/\r?\n[ \t]+/g, ' ')
      .trim();
    map[key] = key in map ? `${map[key]}\n${value}` : value;
  }
  return map;
}

export async function parseCaptured(raw: Buffer, envelope: CapturedMessage['envelope'], receivedAt: Date): Promise<CapturedMessage> {
  const mail = await simpleParser(raw);
  const from = addresses(mail.from)[0];
  return {
    id: randomUUID(),
    receivedAt: receivedAt.toISOString(),
    envelope,
    from: from?.address ?? '',
    fromName: from?.name ?? '',
    to: addresses(mail.to).map((a) => a.address),
    cc: addresses(mail.cc).map((a) => a.address),
    subject: mail.subject ?? '',
    date: (mail.date && !Number.isNaN(mail.date.getTime()) ? mail.date : receivedAt).toISOString(),
    messageId: mail.messageId ?? null,
    text: mail.text ?? null,
    html: typeof mail.html === 'string' ? mail.html : null,
    attachments: mail.attachments.map((a, i) => ({
      filename: a.filename || `attachment-${i + 1}`,
      contentType: a.contentType,
      size: a.content.length,
      content: a.content,
      contentId: a.cid ?? null,
      inline: a.contentDisposition === 'inline' || Boolean(a.related),
    })),
    headers: headerMap(mail.headerLines),
    raw,
  };
}
