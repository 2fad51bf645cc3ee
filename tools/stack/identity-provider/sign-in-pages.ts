const escapeHtml = (value: string): string =>
  value.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

const styles = `*{box-sizing:border-box}body{margin:0;font-family:"Fira Sans",system-ui,sans-serif;background:linear-gradient(160deg,#0f4f4c 0%,#16323a 60%);min-height:100vh;color:#15262b;display:flex;align-items:center;justify-content:center;padding:1rem}
main{background:#fff;border-radius:20px;padding:2rem 1.75rem;width:100%;max-width:24rem;box-shadow:0 12px 40px #0005}
.mark{display:flex;align-items:center;gap:.6rem;font-weight:700;font-size:1.25rem;color:#0f5e5a;margin-bottom:.25rem}
.mark svg{width:32px;height:32px}.sub{margin:0 0 1.5rem;color:#4b5d66;font-size:.95rem}
label{display:block;font-weight:500;margin:1rem 0 .35rem}input{width:100%;font:inherit;padding:.8rem .9rem;border:1px solid #9fb3ba;border-radius:10px}
input:focus{outline:3px solid #f2b552;border-color:#0f5e5a}button{margin-top:1.5rem;width:100%;min-height:48px;font:inherit;font-weight:500;border:0;border-radius:24px;background:#0f5e5a;color:#fff;cursor:pointer}
button:hover{background:#0b4744}.error{background:#fde8e4;color:#8a1f11;border-radius:10px;padding:.7rem .9rem;margin:0 0 .5rem}
.alt{margin-top:1.25rem;font-size:.9rem;color:#4b5d66}.alt a{color:#0f5e5a}.note{font-size:.8rem;color:#6a7b82;margin-top:1.5rem;border-top:1px solid #e3eaec;padding-top:1rem}`;

const logo = `<svg viewBox="0 0 32 32" aria-hidden="true"><rect width="32" height="32" rx="8" fill="#0f5e5a"/><path d="M6 8c4 0 6 16 20 16" stroke="#f2b552" stroke-width="3" fill="none" stroke-linecap="round"/><circle cx="11" cy="14" r="2" fill="#fff"/><circle cx="19" cy="21" r="2" fill="#fff"/></svg>`;

function page(title: string, body: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)} · Fieldcurve sign-in</title><style>${styles}</style></head>
<body><main><div class="mark">${logo}<span>Fieldcurve</span></div>${body}
<p class="note">Local sign-in service for development and demos. In production Fieldcurve uses your organisation's own sign-in.</p></main></body></html>`;
}

export function signInPage(uid: string, email: string, error?: string): string {
  return page(
    'Sign in',
    `<p class="sub">Sign in to continue to your studies.</p>
${error ? `<p class="error" role="alert">${escapeHtml(error)}</p>` : ''}
<form method="post" action="/interaction/${uid}/sign-in" autocomplete="on">
<label for="email">E-mail</label><input id="email" name="email" type="email" required value="${escapeHtml(email)}" autocomplete="username">
<label for="password">Password</label><input id="password" name="password" type="password" required autocomplete="current-password" ${email ? 'autofocus' : ''}>
<button type="submit">Sign in</button></form>
<p class="alt">First time here? <a href="/interaction/${uid}/create-account">Create your sign-in</a></p>`,
  );
}

export function createAccountPage(uid: string, email: string, error?: string): string {
  return page(
    'Create your sign-in',
    `<p class="sub">Choose a password for your Fieldcurve sign-in.</p>
${error ? `<p class="error" role="alert">${escapeHtml(error)}</p>` : ''}
<form method="post" action="/interaction/${uid}/create-account">
<label for="name">Your name</label><input id="name" name="name" required autocomplete="name">
<label for="email">E-mail</label><input id="email" name="email" type="email" required value="${escapeHtml(email)}" autocomplete="username">
<label for="password">Password (at least 10 characters)</label><input id="password" name="password" type="password" required minlength="10" autocomplete="new-password">
<button type="submit">Create and sign in</button></form>
<p class="alt"><a href="/interaction/${uid}">I already have a sign-in</a></p>`,
  );
}

export function problemPage(message: string): string {
  return page(
    'Sign-in problem',
    `<p class="error" role="alert">${escapeHtml(message)}</p><p class="alt">Go back to Fieldcurve and start signing in again.</p>`,
  );
}
