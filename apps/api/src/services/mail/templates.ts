import mjml2html from 'mjml';
import { formatCents, type OrderBill } from '@fryline/schemas';

/**
 * Every e-mail is a list of blocks. The HTML part is built from them with
 * MJML (which turns its layout into the table markup common mail clients
 * render) and the text part from the very same blocks, so both say the same.
 */

export interface RenderedMail {
  subject: string;
  text: string;
  html: string;
}

export interface MailShop {
  name: string;
  /** An absolute URL of the shop's logo, when it has one. */
  logoUrl?: string | null;
  /** The shop's currency (ISO 4217) for every amount in the mail; US dollars when not given. */
  currency?: string;
}

/** The mail frame's view of the shop settings: name, logo and currency. */
export const mailShopOf = (settings: { shopName: string; logoUrl: string | null; currency: string }): MailShop => ({
  name: settings.shopName,
  logoUrl: settings.logoUrl,
  currency: settings.currency,
});

export type MailBlock =
  | { type: 'paragraph'; text: string }
  | { type: 'heading'; text: string }
  /** The pickup code, large, with its QR code image (attached with this Content-ID). */
  | { type: 'code'; code: string; qrCid?: string }
  /** Label–value rows, such as the pickup place and window. */
  | { type: 'facts'; part: string; rows: Array<[string, string]> }
  | { type: 'bill'; bill: OrderBill; refundedCents?: number }
  | { type: 'allergens'; text: string }
  /** A highlighted note, such as the refund deadline. */
  | { type: 'note'; part: string; text: string }
  | { type: 'button'; label: string; href: string };

export interface MailContent {
  subject: string;
  shop: MailShop;
  /** The line mail clients show beside the subject. */
  preview: string;
  blocks: MailBlock[];
}

// Fryline's palette (packages/ui/src/theme.css): plum ink on cream paper, toasted-sugar accent.
const ink = '#2b1830';
const muted = '#6a5566';
const paper = '#fbf6ec';
const crumb = '#f4e9d6';
const line = '#e2d2b8';
const plum = '#56305f';
const sugar = '#8a4f17';
const font = 'Nunito, Helvetica, Arial, sans-serif';

const escape = (s: string) =>
  s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
const html = (s: string) => escape(s).replace(/\n/g, '<br>');

function blockMjml(block: MailBlock, currency?: string): string {
  const money = (cents: number) => formatCents(cents, currency);
  switch (block.type) {
    case 'paragraph':
      return `<mj-text>${html(block.text)}</mj-text>`;
    case 'heading':
      return `<mj-text font-size="20px" font-weight="800" padding-top="18px">${html(block.text)}</mj-text>`;
    case 'code':
      return [
        `<mj-text align="center" padding-top="16px"><p style="margin:0;color:${muted};font-size:14px">Your pickup code</p>` +
          `<p data-mail="code" style="margin:4px 0 0;font-family:Menlo,Consolas,monospace;font-size:34px;font-weight:700;letter-spacing:6px;color:${ink}">${escape(block.code)}</p></mj-text>`,
        block.qrCid
          ? `<mj-image src="cid:${escape(block.qrCid)}" alt="QR code for pickup code ${escape(block.code)}" width="200px" height="200px" css-class="pickup-qr" />`
          : '',
      ].join('');
    case 'facts':
      return `<mj-table css-class="mail-${escape(block.part)}" padding-top="8px">${block.rows
        .map(
          ([label, value]) =>
            `<tr><th align="left" valign="top" style="padding:6px 12px 6px 0;color:${muted};font-weight:600;white-space:nowrap">${html(label)}</th><td style="padding:6px 0">${html(value)}</td></tr>`,
        )
        .join('')}</mj-table>`;
    case 'bill': {
      const rows = block.bill.lines.map(
        (l) =>
          `<tr data-mail="bill-line" data-cents="${l.cents}"><td style="padding:4px 12px 4px ${l.kind === 'box' ? '0' : '14px'};${l.kind === 'box' ? 'font-weight:700' : `color:${muted}`}">${html(l.label)}</td><td align="right" style="padding:4px 0;white-space:nowrap">${money(l.cents)}</td></tr>`,
      );
      rows.push(
        `<tr data-mail="bill-total" data-cents="${block.bill.totalCents}"><td style="padding:8px 12px 4px 0;border-top:1px solid ${line};font-weight:800;font-size:17px">Total</td><td align="right" style="padding:8px 0 4px;border-top:1px solid ${line};font-weight:800;font-size:17px">${money(block.bill.totalCents)}</td></tr>`,
      );
      if (block.bill.includedTaxCents !== null) {
        rows.push(`<tr><td style="padding:2px 12px 2px 0;color:${muted};font-size:14px">Tax included in the prices</td><td align="right" style="color:${muted};font-size:14px">${money(block.bill.includedTaxCents)}</td></tr>`);
      }
      if (block.refundedCents) {
        rows.push(`<tr><td style="padding:2px 12px 2px 0">Refunded to your card</td><td align="right">−${money(block.refundedCents)}</td></tr>`);
      }
      return `<mj-table css-class="mail-bill" padding-top="8px">${rows.join('')}</mj-table>`;
    }
    case 'allergens':
      return `<mj-text container-background-color="${crumb}" padding="12px 16px"><p data-mail="allergens" style="margin:0"><strong>Allergens in this order:</strong> ${html(block.text)}</p></mj-text>`;
    case 'note':
      return `<mj-text padding-top="12px"><p data-mail="${escape(block.part)}" style="margin:0;padding-left:12px;border-left:4px solid ${sugar}">${html(block.text)}</p></mj-text>`;
    case 'button':
      return `<mj-button href="${escape(block.href)}" background-color="${plum}" color="#ffffff" font-weight="800" border-radius="999px" inner-padding="12px 22px" align="left">${escape(block.label)}</mj-button>`;
  }
}

function blockText(block: MailBlock, currency?: string): string {
  const money = (cents: number) => formatCents(cents, currency);
  switch (block.type) {
    case 'paragraph':
      return block.text;
    case 'heading':
      return block.text.toUpperCase();
    case 'code':
      return `Your pickup code: ${block.code}`;
    case 'facts':
      return block.rows.map(([label, value]) => `${label}: ${value.replace(/\n/g, ', ')}`).join('\n');
    case 'bill': {
      const width = 40;
      const row = (label: string, cents: string) => `${label}${' '.repeat(Math.max(1, width - label.length - cents.length))}${cents}`;
      const rows = block.bill.lines.map((l) => row(l.kind === 'box' ? l.label : `  ${l.label}`, money(l.cents)));
      rows.push('-'.repeat(width), row('Total', money(block.bill.totalCents)));
      if (block.bill.includedTaxCents !== null) rows.push(row('Tax included in the prices', money(block.bill.includedTaxCents)));
      if (block.refundedCents) rows.push(row('Refunded to your card', `−${money(block.refundedCents)}`));
      return rows.join('\n');
    }
    case 'allergens':
      return `Allergens in this order: ${block.text}`;
    case 'note':
      return block.text;
    case 'button':
      return `${block.label}: ${block.href}`;
  }
}

/** The mail's text part: the same blocks, in the same order, as plain text. */
export function mailText(content: MailContent): string {
  const name = content.shop.name;
  return `${name ? `${name}\n\n` : ''}${content.blocks.map((b) => blockText(b, content.shop.currency)).join('\n\n')}\n\n${name ? `— ${name}\n` : ''}Sent with Fryline, the shop's ordering software.\n`;
}

/**
 * A mail of plain paragraphs in the same MJML frame, under the shop's name
 * and logo and signed with its name (the paragraphs need no sign-off).
 */
export function paragraphMail(subject: string, paragraphs: string[], shop: MailShop): Promise<RenderedMail> {
  return renderMail({ subject, shop, preview: paragraphs[1] ?? paragraphs[0] ?? subject, blocks: paragraphs.map((text) => ({ type: 'paragraph', text })) });
}

export async function renderMail(content: MailContent): Promise<RenderedMail> {
  const { shop } = content;
  const header = shop.logoUrl
    ? `<mj-image src="${escape(shop.logoUrl)}" alt="${escape(shop.name)}" width="120px" align="left" padding="0 24px 4px" css-class="shop-logo" />`
    : '';
  const source = `<mjml lang="en">
  <mj-head>
    <mj-title>${escape(content.subject)}</mj-title>
    <mj-preview>${escape(content.preview)}</mj-preview>
    <mj-attributes>
      <mj-all font-family="${font}" />
      <mj-text color="${ink}" font-size="16px" line-height="1.5" padding="6px 24px" />
      <mj-table color="${ink}" font-size="16px" line-height="1.4" padding="6px 24px" />
      <mj-button padding="12px 24px" />
      <mj-image padding="8px 24px" />
    </mj-attributes>
  </mj-head>
  <mj-body background-color="${paper}" width="600px">
    ${shop.name ? `<mj-section padding="24px 0 8px">
      <mj-column>
        ${header}
        <mj-text font-size="24px" font-weight="800" color="${plum}" padding="4px 24px"><p data-mail="shop-name" style="margin:0">${escape(shop.name)}</p></mj-text>
      </mj-column>
    </mj-section>` : '<mj-section padding="12px 0 0"><mj-column><mj-spacer height="4px" /></mj-column></mj-section>'}
    <mj-section background-color="#ffffff" border-radius="16px" padding="12px 0 20px">
      <mj-column>
        ${content.blocks.map((b) => blockMjml(b, shop.currency)).join('\n        ')}
      </mj-column>
    </mj-section>
    <mj-section padding="12px 0 24px">
      <mj-column>
        ${shop.name ? `<mj-text font-size="14px" color="${muted}">— ${escape(shop.name)}</mj-text>` : ''}
        <mj-text font-size="12px" color="${muted}" padding-top="0">Sent with Fryline, the shop's ordering software.</mj-text>
      </mj-column>
    </mj-section>
  </mj-body>
</mjml>`;
  const result = await mjml2html(source, { validationLevel: 'strict', keepComments: false });
  return { subject: content.subject, text: mailText(content), html: result.html };
}

export function welcomeMail(name: string, shopName: string, shopUrl: string): Promise<RenderedMail> {
  return renderMail({
    subject: `Welcome to ${shopName}`,
    shop: { name: shopName },
    preview: 'Your account is ready.',
    blocks: [
      { type: 'paragraph', text: `Hello ${name || 'there'},` },
      { type: 'paragraph', text: 'Your account is ready. You can now pre-order boxes for our upcoming bake days, pay up front, and collect them with a pickup code.' },
      { type: 'button', label: "See what's baking", href: shopUrl },
      { type: 'paragraph', text: 'Our doughnuts are made in a small kitchen and contain wheat, milk and eggs. Each item lists its allergens; please check them before you order.' },
    ],
  });
}
