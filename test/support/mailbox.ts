import { readTestEnvironment } from './environment';

// smtp-tester ships no types; only the calls used here are described.
const smtpTester = require('smtp-tester') as { init: (port: number) => SmtpTester };

type CapturedEmail = { receivers: Record<string, boolean>; headers: Record<string, string>; body: string };
type SmtpTester = {
  bind: (handler: (address: string, id: number, email: CapturedEmail) => void) => void;
  stop: (callback: () => void) => void;
};

export type Mail = { to: string[]; subject: string; text: string };

export type Mailbox = {
  /** Waits for a message to `to` whose subject contains `subjectPart`, received after the call began or later. */
  waitFor: (to: string, subjectPart: string, timeoutMs?: number) => Promise<Mail>;
  /** Forgets everything received so far. */
  clear: () => void;
  stop: () => Promise<void>;
};

/** The SMTP fake the API delivers to, on the port named by LEASTLINE_SMTP_URL. */
export function startMailbox(): Mailbox {
  const port = Number(new URL(readTestEnvironment().LEASTLINE_SMTP_URL).port);
  const server = smtpTester.init(port);
  const received: Mail[] = [];
  server.bind((_address, _id, email) => {
    received.push({
      to: Object.keys(email.receivers).map((address) => address.toLowerCase()),
      subject: email.headers.subject ?? '',
      text: email.body ?? '',
    });
  });

  return {
    clear: () => {
      received.length = 0;
    },
    async waitFor(to, subjectPart, timeoutMs = 15_000) {
      const deadline = Date.now() + timeoutMs;
      const wanted = to.toLowerCase();
      while (Date.now() < deadline) {
        const index = received.findIndex((mail) => mail.to.includes(wanted) && mail.subject.includes(subjectPart));
        if (index >= 0) return received.splice(index, 1)[0] as Mail;
        await new Promise((resolve) => setTimeout(resolve, 100));
      }
      throw new Error(`No message to ${to} about "${subjectPart}" within ${timeoutMs} ms`);
    },
    stop: () => new Promise<void>((resolve) => server.stop(() => resolve())),
  };
}

/** The first console link in a message, e.g. …/invitations/accept#token=… */
export function linkIn(mail: Mail, path: string): string {
  const match = mail.text.match(new RegExp(`https?://\\S+${path.replace(/[/.]/g, '\\$&')}#token=[^\\s]+`));
  if (!match) throw new Error(`The message "${mail.subject}" holds no ${path} link:\n${mail.text}`);
  return match[0];
}
