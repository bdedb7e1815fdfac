import { Body, Controller, Get, HttpCode, HttpStatus, Patch, Post, UseGuards } from '@nestjs/common';
import {
  ApiAcceptedResponse,
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiTags,
  ApiTooManyRequestsResponse,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import { ThrottlerGuard } from '@nestjs/throttler';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Public } from '../common/decorators/public.decorator.js';
import { ChangePasswordDto } from '../users/dto/change-password.dto.js';
import { UpdateProfileDto } from '../users/dto/update-profile.dto.js';
import { UserDto } from '../users/dto/user.dto.js';
import type { User } from '../users/user.entity.js';
import { UsersService } from '../users/users.service.js';
import { AllowTemporaryPassword } from '../common/decorators/allow-temporary-password.decorator.js';
import { AuthService } from './auth.service.js';
import { PasswordResetAnswerDto, PasswordResetConfirmDto, PasswordResetRequestDto } from './dto/password-reset.dto.js';
import { PasswordResetService } from './password-reset.service.js';
import { LoginResponseDto } from './dto/login-response.dto.js';
import { LoginDto } from './dto/login.dto.js';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly users: UsersService,
    private readonly resets: PasswordResetService,
  ) {}

  /** Rate limited per client IP (TACET_LOGIN_LIMIT_PER_MINUTE, see AuthModule). */
  @Public()
  @UseGuards(ThrottlerGuard)
  @Post('login')
  @HttpCode(HttpStatus.OK)
  @ApiOkResponse({ type: LoginResponseDto })
  @ApiUnauthorizedResponse({ description: 'Email or password is incorrect' })
  @ApiTooManyRequestsResponse({ description: 'Too many sign-in attempts from this address' })
  login(@Body() dto: LoginDto): Promise<LoginResponseDto> {
    return this.auth.login(dto);
  }

  /** "Forgot password": always 202 with the same answer (no telling which addresses have an account); rate limited like sign-in. */
  @Public()
  @UseGuards(ThrottlerGuard)
  @Post('password-reset')
  @HttpCode(HttpStatus.ACCEPTED)
  @ApiAcceptedResponse({ type: PasswordResetAnswerDto, description: 'Whether or not the address has an account' })
  @ApiTooManyRequestsResponse({ description: 'Too many attempts from this address' })
  async requestPasswordReset(@Body() dto: PasswordResetRequestDto): Promise<PasswordResetAnswerDto> {
    return { message: await this.resets.request(dto.email) };
  }

  @Public()
  @UseGuards(ThrottlerGuard)
  @Post('password-reset/confirm')
  @HttpCode(HttpStatus.OK)
  @ApiOkResponse({ type: PasswordResetAnswerDto, description: 'The new password is set; the link is spent' })
  @ApiBadRequestResponse({ description: 'The link was used or has expired, or the password is not acceptable' })
  @ApiTooManyRequestsResponse({ description: 'Too many attempts from this address' })
  async confirmPasswordReset(@Body() dto: PasswordResetConfirmDto): Promise<PasswordResetAnswerDto> {
    return { message: await this.resets.confirm(dto.token, dto.password) };
  }

  @ApiBearerAuth()
  @AllowTemporaryPassword()
  @Get('me')
  @ApiOkResponse({ type: UserDto })
  me(@CurrentUser() user: User): UserDto {
    return UserDto.from(user);
  }

  @ApiBearerAuth()
  @Patch('me')
  @ApiOkResponse({ type: UserDto })
  async updateMe(@CurrentUser() user: User, @Body() dto: UpdateProfileDto): Promise<UserDto> {
    return UserDto.from(await this.users.updateProfile(user, dto));
  }

  @ApiBearerAuth()
  @AllowTemporaryPassword()
  @Post('me/password')
  @HttpCode(HttpStatus.NO_CONTENT)
  @ApiNoContentResponse({ description: 'Password changed' })
  @ApiBadRequestResponse({ description: 'Current password is incorrect, or the new one is not acceptable' })
  async changePassword(@CurrentUser() user: User, @Body() dto: ChangePasswordDto): Promise<void> {
    await this.users.changePassword(user, dto);
  }
}
