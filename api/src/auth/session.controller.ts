import { Body, Controller, Delete, Get, HttpCode, Post, Res, UseGuards } from '@nestjs/common';
import {
  ApiCreatedResponse,
  ApiForbiddenResponse,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiOperation,
  ApiSecurity,
  ApiTags,
  ApiTooManyRequestsResponse,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import type { FastifyReply } from 'fastify';
import { ClientAddress, CSRF_SECURITY, CurrentAccount, SignedIn } from './auth.decorators';
import { SESSION_COOKIE, sessionCookieOptions } from './auth-cookies';
import { CsrfGuard } from './csrf.guard';
import { CsrfService } from './csrf.service';
import { SessionAccount } from '../common/request-context/request-principals';
import { SignInDto } from './dto/sign-in.dto';
import { CsrfTokenDto, SessionDto } from './dto/session.dto';
import { ClientInfo } from './sessions.service';
import { SessionViewService } from './session-view.service';

@ApiTags('session')
@Controller('v1/session')
export class SessionController {
  constructor(
    private readonly view: SessionViewService,
    private readonly csrf: CsrfService,
  ) {}

  @Get('csrf-token')
  @ApiOperation({
    summary: 'Get a CSRF token',
    description: 'Sets the httpOnly CSRF cookie if needed and returns the token to send in X-Leastline-Csrf.',
  })
  @ApiOkResponse({ type: CsrfTokenDto })
  getCsrfToken(@Res({ passthrough: true }) reply: FastifyReply): CsrfTokenDto {
    return { csrfToken: this.csrf.issue(reply) };
  }

  @Post()
  @UseGuards(CsrfGuard)
  @ApiSecurity(CSRF_SECURITY)
  @ApiOperation({
    summary: 'Sign in',
    description:
      'Checks e-mail and password and sets the httpOnly, SameSite=Strict session cookie. After 5 failures for one ' +
      'address, further attempts are refused for a growing time (429 with Retry-After), whether or not it has an account.',
  })
  @ApiCreatedResponse({ type: SessionDto })
  @ApiUnauthorizedResponse({ description: 'Wrong e-mail or password (the same answer for both).' })
  @ApiForbiddenResponse({ description: 'Missing or wrong CSRF token.' })
  @ApiTooManyRequestsResponse({ description: 'Too many failures for this address.' })
  async signIn(
    @Body() body: SignInDto,
    @ClientAddress() client: ClientInfo,
    @Res({ passthrough: true }) reply: FastifyReply,
  ): Promise<SessionDto> {
    const { token, session } = await this.view.signIn(body.email, body.password, client);
    reply.setCookie(SESSION_COOKIE, token, sessionCookieOptions(this.view.secureCookies, new Date(session.expiresAt)));
    return session;
  }

  @Get()
  @SignedIn()
  @ApiOperation({ summary: 'The current session', description: 'The signed-in account and its teams.' })
  @ApiOkResponse({ type: SessionDto })
  getSession(@CurrentAccount() account: SessionAccount): Promise<SessionDto> {
    return this.view.describe(account);
  }

  @Delete()
  @HttpCode(204)
  @SignedIn()
  @ApiOperation({ summary: 'Sign out', description: 'Ends this session on the server and clears the cookie.' })
  @ApiNoContentResponse({ description: 'Signed out.' })
  async signOut(@CurrentAccount() account: SessionAccount, @Res({ passthrough: true }) reply: FastifyReply): Promise<void> {
    await this.view.signOut(account);
    reply.clearCookie(SESSION_COOKIE, sessionCookieOptions(this.view.secureCookies));
  }
}
