import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsString, MaxLength, MinLength } from 'class-validator';

export class SignInDto {
  @ApiProperty({ example: 'olu.owner@quillfeather.example.test', maxLength: 320 })
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(320)
  email: string;

  @ApiProperty({ example: 'correct-horse-quill-22', minLength: 1, maxLength: 200 })
  @IsString()
  @MinLength(1)
  @MaxLength(200)
  password: string;
}
