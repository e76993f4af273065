import { describe, expect, it } from 'vitest';
import { hs256Signature, parseBasicCredentials, s256Challenge } from './protocol.js';

describe('protocol primitives', () => {
  it('derives the S256 challenge of RFC 7636 Appendix B', () => {
    // RFC 7636, Appendix B (worked example of S256)
    expect(s256Challenge('dBjftJeZ4CVP-mB92K27uhbUJU1p1r_wW1gFWFOEjXk')).toBe('E9Melhoa2OwvFrEMTJguCHaoeK1t8URWbuGJSstw-cM');
  });

  it('signs HS256 like RFC 7515 Appendix A.1', () => {
    // RFC 7515 (JWS), Appendix A.1: signing input, JWK "k" and the resulting signature
    const signingInput =
      'eyJ0eXAiOiJKV1QiLA0KICJhbGciOiJIUzI1NiJ9' +
      '.eyJpc3MiOiJqb2UiLA0KICJleHAiOjEzMDA4MTkzODAsDQogImh0dHA6Ly9leGFtcGxlLmNvbS9pc19yb290Ijp0cnVlfQ';
    const key = Buffer.from('AyM1SysPpbyDfgZld3umj1qzKObwVMkoqQ-EstJQLr_T-1qS0gZH75aKtMN3Yj0iPS4hcgUuTwjAzZr1Z9CAow', 'base64url');
    expect(hs256Signature(signingInput, key)).toBe('dBjftJeZ4CVP-mB92K27uhbUJU1p1r_wW1gFWFOEjXk');
  });

  it('reads HTTP Basic client credentials with form-encoded parts', () => {
    // RFC 6749 §2.3.1: id and secret are application/x-www-form-urlencoded, then joined by ":"
    // RFC 7617 §2: base64 of "Aladdin:open sesame" is QWxhZGRpbjpvcGVuIHNlc2FtZQ==
    expect(parseBasicCredentials('Basic QWxhZGRpbjpvcGVuIHNlc2FtZQ==')).toEqual({ id: 'Aladdin', secret: 'open sesame' });
    const encoded = Buffer.from('my%3Aclient:s+e%25cret').toString('base64');
    expect(parseBasicCredentials(`Basic ${encoded}`)).toEqual({ id: 'my:client', secret: 's e%cret' });
    expect(parseBasicCredentials('Bearer abc')).toBeNull();
  });
});
