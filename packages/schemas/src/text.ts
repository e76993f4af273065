/**
 * Text a person could have typed: no NUL or other C0 control characters
 * (tab and line breaks allowed) and no lone UTF-16 surrogates, which
 * PostgreSQL refuses (NUL) or which turn into replacement characters on the
 * way to UTF-8 (Unicode Standard, ch. 3, D91: a surrogate code point is not a
 * scalar value and has no UTF-8 form).
 */
const BROKEN = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;

export function isPlainText(value: string): boolean {
  return !BROKEN.test(value);
}

export const PLAIN_TEXT_MESSAGE = 'Use plain text: no control characters or broken Unicode';
