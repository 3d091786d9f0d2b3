import { eventually } from './eventually';

/** Reads mail received by the test maildev through its REST API (`/api/email`). */
export interface ReceivedMail {
  id: string;
  subject: string;
  text: string;
  html: string;
  to: { address: string }[];
}

export async function mailsTo(address: string, inboxUrl = process.env.MAIL_INBOX_URL!): Promise<ReceivedMail[]> {
  const res = await fetch(`${inboxUrl}/api/email`);
  if (!res.ok) throw new Error(`maildev answered ${res.status}`);
  const all = (await res.json()) as ReceivedMail[];
  return all.filter((m) => m.to.some((t) => t.address.toLowerCase() === address.toLowerCase()));
}

/** Waits for the newest mail to `address` (mail sending is asynchronous for some routes). */
export async function waitForMail(
  address: string,
  options: { count?: number; timeoutMs?: number; inboxUrl?: string } = {},
): Promise<ReceivedMail> {
  const mails = await eventually(
    () => mailsTo(address, options.inboxUrl),
    (m) => m.length >= (options.count ?? 1),
    {
      what: `mail to ${address}`,
      timeoutMs: options.timeoutMs ?? 10000,
      intervalMs: 100,
    },
  );
  return mails[mails.length - 1];
}

/** The token of the first link in a mail whose path matches (e.g. `/invitations/accept`). */
export function linkToken(mail: ReceivedMail, pathPart: string): string {
  const match = new RegExp(`${pathPart.replace(/\//g, '\\/')}\\?token=([A-Za-z0-9_-]+)`).exec(mail.text);
  if (!match) throw new Error(`no ${pathPart} link in the mail "${mail.subject}"`);
  return match[1];
}
