import { ApiProperty } from '@nestjs/swagger';
import { IsString, MaxLength, MinLength } from 'class-validator';
import { PASSWORD_MIN_LENGTH } from '../../config/environment.js';

/** A password an admin gives someone who cannot sign in; they must choose their own at the next sign-in. */
export class TemporaryPasswordDto {
  @ApiProperty({ minLength: PASSWORD_MIN_LENGTH, maxLength: 200 })
  @IsString()
  @MinLength(PASSWORD_MIN_LENGTH)
  @MaxLength(200)
  password: string;
}
