/**
 * The SMTP fake for e2e tests: smtp-tester listening on the port of LEASTLINE_SMTP_URL (set by
 * .scripts/test.mjs). Messages are read per recipient; every test uses its own random addresses.
 */
// smtp-tester ships no type declarations; this is the part of its surface the tests use.
interface ReceivedMail {
  headers: Record<string, unknown>;
  body: string;
  receivers: Record<string, boolean>;
}
interface SmtpTester {
  remove(id: number): void;
  bind(recipient: string, handler: (address: string | null, id: number, email: ReceivedMail) => void): void;
  unbind(recipient: string, handler: (address: string | null, id: number, email: ReceivedMail) => void): void;
  stop(callback: () => void): void;
}

// eslint-disable-next-line @typescript-eslint/no-require-imports
const smtpTester = require('smtp-tester') as { init(port: number): SmtpTester };

export function smtpPort(): number {
  const url = process.env.LEASTLINE_SMTP_URL;
  if (!url) throw new Error('LEASTLINE_SMTP_URL is not set; run the e2e tests through `npm test` or set it');
  return Number(new URL(url).port);
}

export class MailInbox {
  private constructor(private readonly server: SmtpTester) {}

  static start(): MailInbox {
    return new MailInbox(smtpTester.init(smtpPort()));
  }

  /**
   * Waits for the next message to this address (or one already received and not yet read). Written on
   * bind/unbind because smtp-tester's captureOne leaves its wait timer running, which keeps jest alive.
   */
  async next(recipient: string, waitMs = 8_000): Promise<{ subject: string; body: string; template: string }> {
    const email = await new Promise<ReceivedMail>((resolve, reject) => {
      let settled = false;
      const handler = (_address: string | null, id: number, received: ReceivedMail) => {
        if (settled) return;
        settled = true;
        clearTimeout(timer);
        this.server.remove(id);
        setImmediate(() => this.server.unbind(recipient, handler));
        resolve(received);
      };
      const timer = setTimeout(() => {
        if (settled) return;
        settled = true;
        this.server.unbind(recipient, handler);
        reject(new Error(`No message delivered to ${recipient}`));
      }, waitMs);
      this.server.bind(recipient, handler);
    });
    return {
      subject: String(email.headers.subject ?? ''),
      body: email.body,
      template: String(email.headers['x-leastline-template'] ?? ''),
    };
  }

  stop(): Promise<void> {
    return new Promise((resolve) => this.server.stop(() => resolve()));
  }
}

/** The token from a link in a Leastline e-mail (`…#token=<43 characters>`). */
export function tokenFrom(body: string): string {
  const match = /token=([A-Za-z0-9_-]{43})/.exec(body);
  if (!match?.[1]) throw new Error(`no token link in the message:\n${body}`);
  return match[1];
}
