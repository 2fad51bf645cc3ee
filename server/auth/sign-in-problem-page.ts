const escapeHtml = (value: string): string =>
  value.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/**
 * A small self-contained page for sign-in failures that happen mid-redirect, before the app can
 * show anything; styles are inline in a <style> block allowed by the page's own CSP hash-free rule.
 */
export function signInProblemPage(title: string, explanation: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1"><title>${escapeHtml(title)} · Fieldcurve</title>
<link rel="stylesheet" href="/auth/problem.css"></head>
<body><main><p class="brand">Fieldcurve</p><h1>${escapeHtml(title)}</h1><p>${escapeHtml(explanation)}</p>
<p><a class="button" href="/auth/sign-in">Sign in again</a> <a href="/">Back to the start page</a></p></main></body></html>`;
}

export const signInProblemCss = `body{font-family:"Fira Sans",system-ui,sans-serif;background:#f3f6f5;color:#15262b;margin:0}
main{max-width:30rem;margin:12vh auto;padding:2rem;background:#fff;border-radius:16px;box-shadow:0 2px 12px #0002}
.brand{font-weight:700;color:#0f5e5a;letter-spacing:.02em}h1{font-size:1.4rem}
.button{display:inline-block;background:#0f5e5a;color:#fff;padding:.7rem 1.2rem;border-radius:24px;text-decoration:none;margin-right:1rem}
a{color:#0f5e5a}`;
