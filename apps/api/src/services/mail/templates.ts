// Plain, readable e-mails. Each template returns the text and an HTML
// version built from the same paragraphs.

export interface RenderedMail {
  subject: string;
  text: string;
  html: string;
}

const escape = (s: string) =>
  s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');

export function renderMail(subject: string, paragraphs: string[], extraHtml = ''): RenderedMail {
  const text = `${paragraphs.join('\n\n')}\n`;
  const html = `<!doctype html><html><body style="font-family:Helvetica,Arial,sans-serif;color:#2b2118;max-width:560px">
${paragraphs.map((p) => `<p>${escape(p).replace(/\n/g, '<br>')}</p>`).join('\n')}
${extraHtml}
</body></html>`;
  return { subject, text, html };
}

export function welcomeMail(name: string, shopName: string, shopUrl: string): RenderedMail {
  return renderMail(`Welcome to ${shopName}`, [
    `Hello ${name || 'there'},`,
    `Your account is ready. You can now pre-order boxes for our upcoming bake days, pay up front, and collect them with a pickup code.`,
    `See what's baking: ${shopUrl}`,
    `Our doughnuts are made in a small kitchen and contain wheat, milk and eggs. Each item lists its allergens; please check them before you order.`,
    `— ${shopName}`,
  ]);
}
