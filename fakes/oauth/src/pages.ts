import { DEMO_ACCOUNTS } from './accounts.js';

export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

const STYLE = `
  :root { color-scheme: light; }
  body { margin: 0; font: 16px/1.45 system-ui, sans-serif; background: #eef2f0; color: #1d2b27; }
  main { max-width: 30rem; margin: 3rem auto; background: #fff; border: 1px solid #c8d4cf; border-radius: 10px; padding: 1.5rem 1.75rem; }
  h1 { font-size: 1.25rem; margin: 0 0 .25rem; }
  .tag { display: inline-block; font-size: .75rem; letter-spacing: .06em; text-transform: uppercase; background: #1d5c4d; color: #fff; border-radius: 4px; padding: .1rem .45rem; margin-bottom: .75rem; }
  p.lead { margin: 0 0 1.25rem; color: #4a5b55; }
  .accounts form { margin: 0 0 .5rem; }
  button.account { width: 100%; display: flex; flex-direction: column; align-items: flex-start; gap: .1rem; text-align: left;
    background: #f7faf9; border: 1px solid #c8d4cf; border-radius: 8px; padding: .6rem .8rem; cursor: pointer; font: inherit; color: inherit; }
  button.account:hover, button.account:focus-visible { border-color: #1d5c4d; background: #e6f0ec; }
  .who { font-weight: 600; } .addr { font-size: .9rem; } .hint { font-size: .8rem; color: #5d6e68; }
  fieldset { border: 1px solid #c8d4cf; border-radius: 8px; margin: 1.25rem 0 0; padding: .75rem .9rem; }
  legend { font-weight: 600; padding: 0 .3rem; }
  label { display: block; margin: .4rem 0 .2rem; font-size: .9rem; }
  input[type=email], input[type=text] { width: 100%; box-sizing: border-box; padding: .45rem .55rem; border: 1px solid #9fb1aa; border-radius: 6px; font: inherit; }
  label.check { display: flex; gap: .4rem; align-items: center; }
  .primary { margin-top: .75rem; background: #1d5c4d; color: #fff; border: 0; border-radius: 6px; padding: .5rem 1rem; font: inherit; cursor: pointer; }
  .deny { margin-top: 1.25rem; text-align: right; }
  .deny button { background: none; border: 1px solid #a33b2b; color: #a33b2b; border-radius: 6px; padding: .4rem .9rem; font: inherit; cursor: pointer; }
  .error { background: #fbeae7; border: 1px solid #e3a79c; color: #7a2517; border-radius: 6px; padding: .6rem .8rem; margin: 0 0 1rem; }
  code { background: #eef2f0; padding: 0 .25rem; border-radius: 3px; }
`;

function layout(title: string, body: string): string {
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)}</title><style>${STYLE}</style></head>
<body><main><span class="tag">Local sign-in stand-in</span>${body}</main></body></html>`;
}

/** Hidden inputs that carry the authorization request through each form. */
function hiddenFields(params: Record<string, string | undefined>): string {
  return Object.entries(params)
    .filter((entry): entry is [string, string] => entry[1] !== undefined)
    .map(([k, v]) => `<input type="hidden" name="${escapeHtml(k)}" value="${escapeHtml(v)}">`)
    .join('');
}

export interface ChooserOptions {
  clientId: string;
  request: Record<string, string | undefined>;
  loginHint?: string;
  error?: string;
  name?: string;
  emailVerified?: boolean;
}

export function chooserPage(opts: ChooserOptions): string {
  const hidden = hiddenFields(opts.request);
  const accounts = DEMO_ACCOUNTS.map(
    (a) => `<form method="post" action="/authorize">${hidden}
<input type="hidden" name="email" value="${escapeHtml(a.email)}"><input type="hidden" name="email_verified" value="true">
<button class="account" type="submit" name="decision" value="allow"><span class="who">${escapeHtml(a.name)}</span>
<span class="addr">${escapeHtml(a.email)}</span><span class="hint">${escapeHtml(a.role)}</span></button></form>`,
  ).join('\n');
  const error = opts.error ? `<p class="error" role="alert">${escapeHtml(opts.error)}</p>` : '';
  const checked = opts.emailVerified === false ? '' : ' checked';
  return layout(
    'Choose an account',
    `<h1>Choose an account</h1>
<p class="lead">to continue to <code>${escapeHtml(opts.clientId)}</code>. Every account here is made up; no password is asked.</p>
${error}
<div class="accounts">${accounts}</div>
<form method="post" action="/authorize">${hidden}
<fieldset><legend>Use another address</legend>
<label for="email">E-mail address</label>
<input id="email" name="email" type="email" required autocomplete="off" value="${escapeHtml(opts.loginHint ?? '')}">
<label for="name">Display name (optional)</label>
<input id="name" name="name" type="text" maxlength="100" value="${escapeHtml(opts.name ?? '')}">
<input type="hidden" name="email_verified" value="false">
<label class="check"><input type="checkbox" name="email_verified" value="true"${checked}> Address verified</label>
<button class="primary" type="submit" name="decision" value="allow">Continue</button>
</fieldset></form>
<form class="deny" method="post" action="/authorize">${hidden}<button type="submit" name="decision" value="deny">Deny</button></form>`,
  );
}

export function errorPage(message: string): string {
  return layout(
    'Sign-in request refused',
    `<h1>This sign-in request can't be used</h1><p class="error" role="alert">${escapeHtml(message)}</p>
<p class="lead">Nothing was sent back to the application. Check the client id, the redirect URI and the PKCE parameters it sends.</p>`,
  );
}

const AVATAR_COLOURS = ['#1d5c4d', '#7a4b1d', '#3b4f8a', '#8a3b5c', '#4f6b1d', '#5c3b8a'];

/** A round avatar with the person's initials, served by the fake itself. */
export function avatarSvg(name: string, sub: string): string {
  const initials = name
    .split(/\s+/)
    .filter(Boolean)
    .slice(0, 2)
    .map((w) => w.charAt(0).toUpperCase())
    .join('');
  const colour = AVATAR_COLOURS[Number(BigInt(sub.replace(/\D/g, '') || '0') % BigInt(AVATAR_COLOURS.length))];
  return `<svg xmlns="http://www.w3.org/2000/svg" width="96" height="96" viewBox="0 0 96 96">
<circle cx="48" cy="48" r="48" fill="${colour}"/>
<text x="48" y="60" font-family="sans-serif" font-size="36" fill="#fff" text-anchor="middle">${escapeHtml(initials)}</text></svg>`;
}
