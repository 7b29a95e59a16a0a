import { randomUUID } from 'node:crypto';
import { appOrigin } from './browser.ts';

const inbox = process.env.MAIL_INBOX_URL ?? 'http://127.0.0.1:4504';

export const uniqueEmail = (label: string) => `${label}-${randomUUID().slice(0, 8)}@example.test`;

interface CaughtMail {
  subject: string;
  text?: string;
  to: { address: string }[];
}

/** Polls the mail catcher's REST API until a message for `to` with a matching subject arrives. */
export async function waitForMail(
  to: string,
  subject: RegExp,
  timeoutMs = 15_000,
): Promise<CaughtMail> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const mails = (await (await fetch(`${inbox}/email`)).json()) as CaughtMail[];
    const found = mails.find((m) => m.to.some((r) => r.address === to) && subject.test(m.subject));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`No mail for ${to} matching ${subject}`);
}

export const firstLink = (mail: CaughtMail) => {
  const link = mail.text?.match(/https?:\/\/\S+/)?.[0];
  if (!link) throw new Error(`No link in "${mail.subject}"`);
  return link;
};

/** A person set up through the real API (sign-up, mailed confirmation), cookies kept. */
export class ApiPerson {
  private cookies = new Map<string, string>();
  userId = '';
  constructor(
    readonly email: string,
    readonly password: string,
    readonly name: string,
  ) {}

  static async signUp(label: string, name: string): Promise<ApiPerson> {
    const person = new ApiPerson(uniqueEmail(label), `pw-${randomUUID()}`, name);
    const res = await person.call('POST', '/api/auth/sign-up/email', {
      email: person.email,
      password: person.password,
      name,
    });
    if (!res.ok) throw new Error(`sign-up failed: ${res.status}`);
    person.userId = ((await res.json()) as { user: { id: string } }).user.id;
    const link = new URL(firstLink(await waitForMail(person.email, /confirm/i)));
    await person.call('GET', link.pathname + link.search);
    return person;
  }

  /** The session cookies, for a browser context that should start signed in as this person. */
  browserCookies(): { name: string; value: string; url: string }[] {
    return [...this.cookies].map(([name, value]) => ({ name, value, url: appOrigin }));
  }

  async call(method: string, path: string, body?: unknown): Promise<Response> {
    const headers: Record<string, string> = { origin: appOrigin };
    if (this.cookies.size)
      headers.cookie = [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
    // A form (photos) sets its own multipart content type; anything else goes as JSON.
    const form = body instanceof FormData;
    if (body !== undefined && !form) headers['content-type'] = 'application/json';
    const res = await fetch(`${appOrigin}${path}`, {
      method,
      headers,
      body: body === undefined ? undefined : form ? body : JSON.stringify(body),
      redirect: 'manual',
    });
    for (const line of res.headers.getSetCookie()) {
      const [pair = ''] = line.split(';');
      const [key = '', ...value] = pair.split('=');
      this.cookies.set(key.trim(), value.join('='));
    }
    return res;
  }
}

/** The body of a 201 answer; anything else fails with the server's words. */
export async function created<T>(res: Response): Promise<T> {
  if (res.status !== 201) throw new Error(`expected 201, got ${res.status}: ${await res.text()}`);
  return (await res.json()) as T;
}
