import { Body, Controller, HttpCode, Post, UseGuards } from '@nestjs/common';
import {
  ApiAcceptedResponse,
  ApiForbiddenResponse,
  ApiGoneResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOperation,
  ApiSecurity,
  ApiTags,
} from '@nestjs/swagger';
import { ClientAddress, CSRF_SECURITY } from './auth.decorators';
import { CsrfGuard } from './csrf.guard';
import { CompletePasswordResetDto, PasswordResetAcceptedDto, RequestPasswordResetDto } from './dto/password-reset.dto';
import { PasswordResetsService } from './password-resets.service';
import { ClientInfo } from './sessions.service';

@ApiTags('session')
@Controller('v1/password-resets')
@UseGuards(CsrfGuard)
@ApiSecurity(CSRF_SECURITY)
@ApiForbiddenResponse({ description: 'Missing or wrong CSRF token.' })
export class PasswordResetsController {
  constructor(private readonly resets: PasswordResetsService) {}

  @Post()
  @HttpCode(202)
  @ApiOperation({
    summary: 'Ask for a password-reset e-mail',
    description: 'Always answers 202 with the same body; if the address has an account, a one-time link valid for 30 minutes is e-mailed.',
  })
  @ApiAcceptedResponse({ type: PasswordResetAcceptedDto })
  requestPasswordReset(@Body() body: RequestPasswordResetDto, @ClientAddress() client: ClientInfo): PasswordResetAcceptedDto {
    this.resets.request(body.email, client.ipAddress);
    return { message: 'If an account uses this address, a reset link is on its way. It expires in 30 minutes.' };
  }

  @Post('completion')
  @HttpCode(204)
  @ApiOperation({
    summary: 'Set a new password with an e-mailed link',
    description: 'Spends the link, sets the password and signs the account out everywhere.',
  })
  @ApiNoContentResponse({ description: 'Password changed.' })
  @ApiNotFoundResponse({ description: 'The token matches no link.' })
  @ApiGoneResponse({ description: 'The link expired or was already used.' })
  async completePasswordReset(@Body() body: CompletePasswordResetDto): Promise<void> {
    await this.resets.complete(body.token, body.newPassword);
  }
}
