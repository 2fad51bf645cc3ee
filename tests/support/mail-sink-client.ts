/** Reads what the local mail sink caught (the sink that `npm test` started). */
export interface SinkMessage {
  id: number;
  to: string[];
  subject: string;
  text: string;
}

export async function sinkMessages(): Promise<SinkMessage[]> {
  const response = await fetch(`${process.env['MAIL_SINK_URL']}/messages`);
  return (await response.json()) as SinkMessage[];
}

/** Waits for the newest message to one address (mail delivery is asynchronous). */
export async function waitForMessageTo(address: string, timeoutMs = 5000): Promise<SinkMessage> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const found = (await sinkMessages()).find((m) => m.to.includes(address));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`No message to ${address} reached the mail sink within ${timeoutMs} ms`);
}

/** The first link in a message's text. */
export function firstLink(message: SinkMessage): string {
  const match = /https?:\/\/\S+/.exec(message.text);
  if (!match) throw new Error(`The message "${message.subject}" has no link`);
  return match[0];
}
