import { ApiProperty } from '@nestjs/swagger';
import { IsEmail, IsNotEmpty, IsString, MaxLength } from 'class-validator';
import { NormalizeEmail } from '../../users/dto/dto-transforms.js';

export class LoginDto {
  @ApiProperty({ example: 'engineer@tacet.test', maxLength: 200 })
  @NormalizeEmail()
  @IsEmail()
  @MaxLength(200)
  email: string;

  @ApiProperty({ example: 'tacet-demo', maxLength: 200 })
  @IsString()
  @IsNotEmpty()
  @MaxLength(200)
  password: string;
}
