import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsNotEmpty, IsString, MaxLength, MinLength } from 'class-validator';
import { PASSWORD_MIN_LENGTH } from '../../config/environment.js';
import { NormalizeEmail } from '../../users/dto/dto-transforms.js';

export class PasswordResetRequestDto {
  @ApiProperty({ example: 'engineer@tacet.test', maxLength: 200 })
  @NormalizeEmail()
  @IsEmail()
  @MaxLength(200)
  email: string;
}

export class PasswordResetConfirmDto {
  @ApiProperty({ description: 'The token from the link in the e-mail', maxLength: 200 })
  @IsString()
  @IsNotEmpty()
  @MaxLength(200)
  token: string;

  @ApiProperty({ minLength: PASSWORD_MIN_LENGTH, maxLength: 200 })
  @IsString()
  @MinLength(PASSWORD_MIN_LENGTH)
  @MaxLength(200)
  password: string;
}

/** The answer of both password-reset routes: a sentence for the person. */
export class PasswordResetAnswerDto {
  @ApiProperty() message: string;
}
