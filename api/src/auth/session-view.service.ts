import { Injectable } from '@nestjs/common';
import { SessionAccount } from '../common/request-context/request-principals';
import { TeamAccessService } from '../teams/access/team-access.service';
import { SessionDto } from './dto/session.dto';
import { ClientInfo, SessionsService } from './sessions.service';

/** Shapes session answers (account + memberships) for the session routes and invitation acceptance. */
@Injectable()
export class SessionViewService {
  constructor(
    private readonly sessions: SessionsService,
    private readonly teamAccess: TeamAccessService,
  ) {}

  get secureCookies(): boolean {
    return this.sessions.security.secureCookies;
  }

  async signIn(email: string, password: string, client: ClientInfo): Promise<{ token: string; session: SessionDto }> {
    const started = await this.sessions.signIn(email, password, client);
    return { token: started.token, session: await this.build(started.account, started.expiresAt) };
  }

  async describe(account: SessionAccount): Promise<SessionDto> {
    const expiresAt = (await this.sessions.expiryOf(account.sessionId)) ?? new Date();
    return this.build(account, expiresAt);
  }

  signOut(account: SessionAccount): Promise<void> {
    return this.sessions.end(account.sessionId);
  }

  private async build(account: SessionAccount, expiresAt: Date): Promise<SessionDto> {
    const memberships = await this.teamAccess.listMemberships(account.userId);
    return {
      account: { id: account.userId, email: account.email, displayName: account.displayName },
      memberships: memberships.map((membership) => ({
        teamId: membership.teamId,
        teamName: membership.teamName,
        role: membership.role,
      })),
      expiresAt: expiresAt.toISOString(),
    };
  }
}
