import { NestFastifyApplication } from '@nestjs/platform-fastify';
import request, { Response } from 'supertest';

type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

/**
 * A browser-like console caller for supertest: keeps cookies between requests and sends the CSRF header
 * on state-changing methods, fetching the token first as the console does.
 */
export class ConsoleClient {
  private readonly cookies = new Map<string, string>();
  private csrfToken: string | undefined;

  constructor(private readonly app: NestFastifyApplication) {}

  get sessionCookie(): string | undefined {
    return this.cookies.get('leastline_session');
  }

  setCookie(name: string, value: string): void {
    this.cookies.set(name, value);
  }

  async fetchCsrfToken(): Promise<string> {
    const response = await this.raw('get', '/v1/session/csrf-token');
    if (response.status !== 200) throw new Error(`csrf-token answered ${response.status}`);
    this.csrfToken = response.body.csrfToken as string;
    return this.csrfToken;
  }

  /** Sends with cookies and (for POST/PUT/PATCH/DELETE) the CSRF header. */
  async send(method: Method, path: string, body?: unknown, headers: Record<string, string> = {}): Promise<Response> {
    if (method !== 'get' && !this.csrfToken) await this.fetchCsrfToken();
    return this.raw(method, path, body, method === 'get' ? undefined : this.csrfToken, headers);
  }

  /** Sends with cookies but lets the caller choose the CSRF header (or none). */
  async raw(method: Method, path: string, body?: unknown, csrfToken?: string, headers: Record<string, string> = {}): Promise<Response> {
    let pending = request(this.app.getHttpServer())[method](path);
    for (const [name, value] of Object.entries(headers)) pending = pending.set(name, value);
    if (this.cookies.size > 0) {
      pending = pending.set('Cookie', [...this.cookies].map(([name, value]) => `${name}=${value}`).join('; '));
    }
    if (csrfToken !== undefined) pending = pending.set('X-Leastline-Csrf', csrfToken);
    const response = body === undefined ? await pending : await pending.send(body as object);
    this.keepCookies(response);
    return response;
  }

  async signIn(email: string, password: string): Promise<Response> {
    return this.send('post', '/v1/session', { email, password });
  }

  private keepCookies(response: Response): void {
    const header = response.headers['set-cookie'] as unknown;
    const lines = Array.isArray(header) ? (header as string[]) : typeof header === 'string' ? [header] : [];
    for (const line of lines) {
      const [pair = ''] = line.split(';');
      const separator = pair.indexOf('=');
      const name = pair.slice(0, separator).trim();
      const value = pair.slice(separator + 1).trim();
      const expired = /expires=Thu, 01 Jan 1970/i.test(line) || /max-age=0/i.test(line);
      if (!value || expired) this.cookies.delete(name);
      else this.cookies.set(name, value);
    }
  }
}
