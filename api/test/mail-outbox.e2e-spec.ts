import { NestFastifyApplication } from '@nestjs/platform-fastify';
import { QueryTypes } from 'sequelize';
import { PasswordResetsService } from '../src/auth/password-resets.service';
import { MailOutboxService } from '../src/mail/mail-outbox.service';
import { cleanUp, connection, createTeamWithRoles, insertUser, TestTeam, uniqueEmail } from './support/accounts';
import { ConsoleClient } from './support/console-client';
import { MailInbox, tokenFrom } from './support/mail-inbox';
import { createTestApp } from './support/test-app';

interface OutboxRow {
  attempts: number;
  last_error: string | null;
  sent_at: Date | null;
  text_body: string;
}

async function outboxRows(app: NestFastifyApplication, recipient: string): Promise<OutboxRow[]> {
  return connection(app).query<OutboxRow>(`SELECT attempts, last_error, sent_at, text_body FROM mail_outbox WHERE recipient = :recipient`, {
    replacements: { recipient },
    type: QueryTypes.SELECT,
  });
}

describe('mail outbox: actions succeed while the mail server is down, and the mail follows later', () => {
  let app: NestFastifyApplication;
  let inbox: MailInbox | undefined;
  let team: TestTeam;
  const saved = { poll: process.env.LEASTLINE_MAIL_POLL_MS, retry: process.env.LEASTLINE_MAIL_RETRY_BASE_MS };

  beforeAll(async () => {
    // Fast retries so the test does not wait for the production backoff (seconds to an hour).
    process.env.LEASTLINE_MAIL_POLL_MS = '100';
    process.env.LEASTLINE_MAIL_RETRY_BASE_MS = '50';
    app = await createTestApp();
    team = await createTeamWithRoles(app, 'outbox');
  });
  afterAll(async () => {
    await cleanUp(app);
    await app.close();
    await inbox?.stop();
    process.env.LEASTLINE_MAIL_POLL_MS = saved.poll;
    process.env.LEASTLINE_MAIL_RETRY_BASE_MS = saved.retry;
  });

  it('keeps an invitation and a reset e-mail through an SMTP outage and delivers both once it is back', async () => {
    const invitee = uniqueEmail('outage-invitee');
    const started = Date.now();
    const invited = await team.members.owner.client.send('post', `/v1/teams/${team.id}/invitations`, { email: invitee, role: 'developer' });
    expect(invited.status).toBe(201);
    expect(Date.now() - started).toBeLessThan(3_000);

    const user = await insertUser(app, 'outage-reset');
    const reset = await new ConsoleClient(app).send('post', '/v1/password-resets', { email: user.email });
    expect(reset.status).toBe(202);
    await app.get(PasswordResetsService).settle();

    // Let the loop fail at least once against the closed port.
    const deadline = Date.now() + 5_000;
    let pending = await outboxRows(app, invitee);
    while ((pending[0]?.attempts ?? 0) < 1 && Date.now() < deadline) {
      await new Promise((resolve) => setTimeout(resolve, 100));
      pending = await outboxRows(app, invitee);
    }
    expect(pending).toHaveLength(1);
    expect(pending[0]?.sent_at).toBeNull();
    expect(pending[0]?.attempts).toBeGreaterThanOrEqual(1);
    expect(pending[0]?.last_error).toMatch(/ECONNREFUSED|connect/i);
    expect(pending[0]?.text_body).toMatch(/token=/);

    inbox = MailInbox.start();
    const [invitation, resetMail] = await Promise.all([inbox.next(invitee, 15_000), inbox.next(user.email, 15_000)]);
    expect(invitation.template).toBe('invitation');
    expect(tokenFrom(invitation.body)).toHaveLength(43);
    expect(resetMail.template).toBe('password-reset');

    await app.get(MailOutboxService).settle();
    const [delivered] = await outboxRows(app, invitee);
    expect(delivered?.sent_at).not.toBeNull();
    expect(delivered?.last_error).toBeNull();
    // The one-time link is not kept at rest once delivered.
    expect(delivered?.text_body).toBe('');
  });
});
