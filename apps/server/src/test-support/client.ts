import { randomUUID } from 'node:crypto';
import type { RunningServer } from '../server.ts';
import { uniqueRecipient, waitForMail } from './mail-catcher.ts';

/** A request body already encoded once, e.g. a multipart form sent many times by a benchmark. */
export interface EncodedBody {
  bytes: Uint8Array<ArrayBuffer>;
  contentType: string;
}

/** Encodes a form the way fetch would, once, so sending it again costs no encoding. */
export async function encodeForm(form: FormData): Promise<EncodedBody> {
  const encoded = new Response(form);
  return {
    bytes: new Uint8Array(await encoded.arrayBuffer()),
    contentType: encoded.headers.get('content-type') ?? '',
  };
}

const isEncoded = (body: unknown): body is EncodedBody =>
  typeof body === 'object' && body !== null && 'bytes' in body && 'contentType' in body;

/** A fetch wrapper that keeps cookies like a browser, for one person. */
export class TestClient {
  private cookies = new Map<string, string>();
  constructor(private readonly server: RunningServer) {}

  get signedIn(): boolean {
    return [...this.cookies.keys()].some((k) => k.includes('session_token'));
  }

  /** The headers a request from this person carries: origin, cookies and the body's type. */
  headersFor(body?: unknown): Record<string, string> {
    const headers: Record<string, string> = { origin: this.server.deps.config.PUBLIC_ORIGIN };
    if (this.cookies.size > 0)
      headers.cookie = [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
    // FormData (uploads) sets its own multipart content type, an encoded body carries its own;
    // anything else goes as JSON.
    if (isEncoded(body)) headers['content-type'] = body.contentType;
    else if (body !== undefined && !(body instanceof FormData))
      headers['content-type'] = 'application/json';
    return headers;
  }

  async request(method: string, path: string, body?: unknown): Promise<Response> {
    const headers = this.headersFor(body);
    const form = body instanceof FormData;
    const encoded = isEncoded(body);
    const res = await fetch(`${this.server.url}${path}`, {
      method,
      headers,
      body:
        body === undefined ? undefined : form ? body : encoded ? body.bytes : JSON.stringify(body),
      redirect: 'manual',
    });
    for (const line of res.headers.getSetCookie()) {
      const [pair = '', ...attributes] = line.split(';');
      const [name = '', ...value] = pair.split('=');
      const expired = attributes.some((a) => /max-age=0/i.test(a.trim()));
      if (expired) this.cookies.delete(name.trim());
      else this.cookies.set(name.trim(), value.join('='));
    }
    return res;
  }

  /** Follows a link from an e-mail as the browser would (same origin, cookies kept). */
  async visit(link: string): Promise<Response> {
    const url = new URL(link);
    return this.request('GET', url.pathname + url.search);
  }
}

export const firstLink = (text: string | undefined) => {
  const match = text?.match(/https?:\/\/\S+/);
  if (!match) throw new Error(`No link in mail text: ${text}`);
  return match[0];
};

export interface TestPerson {
  client: TestClient;
  email: string;
  password: string;
  name: string;
  userId: string;
}

/** Signs up through better-auth, confirms the address from the real mail, ends signed in. */
export async function signUpVerified(
  server: RunningServer,
  label: string,
  name = `Tester ${label}`,
): Promise<TestPerson> {
  const client = new TestClient(server);
  const email = uniqueRecipient(label);
  const password = `pw-${randomUUID()}`;
  const res = await client.request('POST', '/api/auth/sign-up/email', { email, password, name });
  if (res.status !== 200) throw new Error(`sign-up failed: ${res.status} ${await res.text()}`);
  const { user } = (await res.json()) as { user: { id: string } };
  const mail = await waitForMail(email);
  const verified = await client.visit(firstLink(mail.text));
  if (verified.status !== 302 || !client.signedIn)
    throw new Error(`verification failed: ${verified.status}`);
  return { client, email, password, name, userId: user.id };
}
