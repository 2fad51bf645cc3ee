import type { CaughtMessage } from './mail-sink';

const escapeHtml = (value: string): string =>
  value.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/** A plain page listing caught messages, so a demo user can follow invitation and route links. */
export function renderInbox(messages: readonly CaughtMessage[]): string {
  const items = messages
    .map(
      (m) => `<article><h2>${escapeHtml(m.subject)}</h2>
<p class="meta">To ${escapeHtml(m.to.join(', '))} · ${escapeHtml(m.receivedAt)}</p>
<pre>${escapeHtml(m.text).replace(/(https?:\/\/[^\s<]+)/g, '<a href="$1">$1</a>')}</pre></article>`,
    )
    .join('\n');
  return `<!doctype html><html lang="en"><head><meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>Local mail sink · Fieldcurve</title>
<style>body{font-family:system-ui,sans-serif;max-width:48rem;margin:2rem auto;padding:0 1rem;color:#14232b}
article{border:1px solid #c9d6dc;border-radius:8px;padding:0 1rem;margin:1rem 0}
.meta{color:#4b5d66;font-size:.9rem} pre{white-space:pre-wrap;font-family:inherit}</style></head>
<body><h1>Local mail sink</h1><p>Messages the local Fieldcurve stack sent. Nothing here leaves this machine.</p>
${items || '<p>No messages yet.</p>'}</body></html>`;
}
