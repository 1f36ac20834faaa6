/** Reads the local mail fake's inbox, where every e-mail the app sends in tests arrives. */
export interface InboxMessage {
  id: string;
  from: string;
  to: string[];
  subject: string;
  date: string;
  text: string;
  html: string;
}

const inboxUrl = () => {
  const url = process.env.MAIL_INBOX_URL;
  if (!url) throw new Error('MAIL_INBOX_URL is not set: load the test environment first');
  return url;
};

export async function messagesTo(address: string): Promise<InboxMessage[]> {
  const res = await fetch(`${inboxUrl()}/api/messages?to=${encodeURIComponent(address)}`);
  if (!res.ok) throw new Error(`inbox answered ${res.status}`);
  return (await res.json()) as InboxMessage[];
}

/** Wait for a message to `address` whose subject contains `subject`. */
export async function waitForMail(address: string, subject: string, timeoutMs = 10_000): Promise<InboxMessage> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = (await messagesTo(address)).find((m) => m.subject.includes(subject));
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`no e-mail "${subject}" reached ${address} within ${timeoutMs} ms`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

/** The first link in a message's text that points at `path`, e.g. "/verify-email". */
export function linkIn(message: InboxMessage, path: string): URL {
  const match = message.text.match(/https?:\/\/\S+/g)?.find((href) => new URL(href).pathname === path);
  if (!match) throw new Error(`no ${path} link in "${message.subject}"`);
  return new URL(match);
}
