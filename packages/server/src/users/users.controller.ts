import { Body, Controller, Delete, Get, HttpCode, Param, ParseIntPipe, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiConflictResponse, ApiCreatedResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { CreateUserDto } from './dto/create-user.dto.js';
import { TemporaryPasswordDto } from './dto/temporary-password.dto.js';
import { UpdateUserDto } from './dto/update-user.dto.js';
import { UserDto } from './dto/user.dto.js';
import type { User } from './user.entity.js';
import { UsersService } from './users.service.js';

@ApiTags('users')
@ApiBearerAuth()
@Roles('admin')
@Controller('users')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  @ApiOkResponse({ type: [UserDto], description: 'All users, sorted by email' })
  async findAll(): Promise<UserDto[]> {
    return (await this.users.findAll()).map((user) => UserDto.from(user));
  }

  @Post()
  @ApiCreatedResponse({ type: UserDto })
  @ApiConflictResponse({ description: 'A user with this email already exists' })
  async create(@Body() dto: CreateUserDto): Promise<UserDto> {
    return UserDto.from(await this.users.create(dto));
  }

  @Get(':id')
  @ApiOkResponse({ type: UserDto })
  async findOne(@Param('id', ParseIntPipe) id: number): Promise<UserDto> {
    return UserDto.from(await this.users.findOne(id));
  }

  @Patch(':id')
  @ApiOkResponse({ type: UserDto })
  @ApiConflictResponse({ description: 'An admin cannot deactivate themselves or drop their own admin role' })
  async update(@CurrentUser() actor: User, @Param('id', ParseIntPipe) id: number, @Body() dto: UpdateUserDto): Promise<UserDto> {
    return UserDto.from(await this.users.update(actor, id, dto));
  }

  @Post(':id/temporary-password')
  @HttpCode(200)
  @ApiOkResponse({ type: UserDto, description: 'Set; the user must choose a new password at the next sign-in (mustChangePassword)' })
  async temporaryPassword(@Param('id', ParseIntPipe) id: number, @Body() dto: TemporaryPasswordDto): Promise<UserDto> {
    return UserDto.from(await this.users.setTemporaryPassword(id, dto.password));
  }

  @Delete(':id')
  @ApiOkResponse({ type: UserDto, description: 'The user, now deactivated (rows are never deleted)' })
  @ApiConflictResponse({ description: 'An admin cannot deactivate themselves' })
  async deactivate(@CurrentUser() actor: User, @Param('id', ParseIntPipe) id: number): Promise<UserDto> {
    return UserDto.from(await this.users.deactivate(actor, id));
  }
}
