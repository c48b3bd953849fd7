import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsString, Matches, MaxLength } from 'class-validator';
import { IsAcceptablePassword, PASSWORD_MAX_BYTES, PASSWORD_MIN_LENGTH } from './password.validator';

export class RequestPasswordResetDto {
  @ApiProperty({ example: 'olu.owner@quillfeather.example.test', maxLength: 320 })
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(320)
  email: string;
}

export class PasswordResetAcceptedDto {
  @ApiProperty({
    example: 'If an account uses this address, a reset link is on its way. It expires in 30 minutes.',
    description: 'The same answer whether or not the address has an account.',
  })
  message: string;
}

export class CompletePasswordResetDto {
  @ApiProperty({ description: 'The token from the e-mailed link (the part after "token=").', example: 'q0Wc7u2b3x-9N7wq5hC2sZc1vM4yR8aLkT6pD0fE1gH' })
  @IsString()
  @Matches(/^[A-Za-z0-9_-]{43}$/, { message: 'token must be the 43-character value from the e-mailed link' })
  token: string;

  @ApiProperty({ minLength: PASSWORD_MIN_LENGTH, description: `At least ${PASSWORD_MIN_LENGTH} characters, at most ${PASSWORD_MAX_BYTES} bytes.` })
  @IsAcceptablePassword()
  newPassword: string;
}
