import { applyDecorators } from '@nestjs/common';
import { IsString, MinLength, ValidateBy } from 'class-validator';

export const PASSWORD_MIN_LENGTH = 12;
/** bcrypt reads at most 72 bytes; a longer password would silently lose its tail. */
export const PASSWORD_MAX_BYTES = 72;

export function IsAcceptablePassword() {
  return applyDecorators(
    IsString({ message: '$property must be a string' }),
    MinLength(PASSWORD_MIN_LENGTH, { message: `$property must be at least ${PASSWORD_MIN_LENGTH} characters long` }),
    ValidateBy({
      name: 'maxUtf8Bytes',
      validator: {
        validate: (value: unknown) => typeof value === 'string' && Buffer.byteLength(value, 'utf8') <= PASSWORD_MAX_BYTES,
        defaultMessage: () => `$property must be at most ${PASSWORD_MAX_BYTES} bytes in UTF-8`,
      },
    }),
  );
}
