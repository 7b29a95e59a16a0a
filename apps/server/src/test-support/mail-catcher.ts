import { randomUUID } from 'node:crypto';

/** A unique address per test, so parallel tests never read each other's mail. */
export const uniqueRecipient = (label: string) =>
  `${label}-${randomUUID().slice(0, 8)}@example.test`;

export interface CaughtMail {
  id: string;
  subject: string;
  text?: string;
  html?: string;
  to: { address: string }[];
  headers: Record<string, string>;
  attachments?: { fileName: string; contentType: string }[];
}

/** Polls the mail catcher's REST API until a message for `to` (and subject, if given) arrives. */
export async function waitForMail(
  to: string,
  subject?: RegExp,
  timeoutMs = 10_000,
): Promise<CaughtMail> {
  const inbox = process.env.MAIL_INBOX_URL ?? 'http://127.0.0.1:4504';
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const res = await fetch(`${inbox}/email`);
    const mails = (await res.json()) as CaughtMail[];
    const found = mails.find(
      (m) =>
        m.to.some((r) => r.address.toLowerCase() === to.toLowerCase()) &&
        (!subject || subject.test(m.subject)),
    );
    if (found) return found;
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`No mail for ${to} arrived within ${timeoutMs} ms`);
}
