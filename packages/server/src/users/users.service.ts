import { BadRequestException, ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
import { AppConfig } from '../config/app-config.js';
import { DEMO_PASSWORD } from '../config/environment.js';
import { isUniqueViolation } from '../database/unique-violation.js';
import type { ChangePasswordDto } from './dto/change-password.dto.js';
import type { CreateUserDto } from './dto/create-user.dto.js';
import type { UpdateProfileDto } from './dto/update-profile.dto.js';
import type { UpdateUserDto } from './dto/update-user.dto.js';
import { PasswordService } from './password.service.js';
import { User } from './user.entity.js';

export const normalizeEmail = (email: string): string => email.trim().toLowerCase();

/** The properties of a partial update that were actually sent. */
function sentOnly<T extends object>(changes: T): Partial<T> {
  return Object.fromEntries(Object.entries(changes).filter(([, value]) => value !== undefined)) as Partial<T>;
}

const DUPLICATE_EMAIL = 'A user with this email already exists';

@Injectable()
export class UsersService {
  constructor(
    @InjectRepository(User) private readonly users: Repository<User>,
    private readonly passwords: PasswordService,
    private readonly config: AppConfig,
  ) {}

  findAll(): Promise<User[]> {
    return this.users.find({ order: { email: 'ASC' } });
  }

  async findOne(id: number): Promise<User> {
    const user = await this.users.findOneBy({ id });
    if (!user) throw new NotFoundException('User not found');
    return user;
  }

  findByEmail(email: string): Promise<User | null> {
    return this.users.findOneBy({ email: normalizeEmail(email) });
  }

  /** The user behind a token, or null when it no longer exists or was deactivated. */
  findActiveById(id: number): Promise<User | null> {
    return this.users.findOneBy({ id, active: true });
  }

  async create(dto: CreateUserDto): Promise<User> {
    this.assertAcceptablePassword(dto.password);
    const email = normalizeEmail(dto.email);
    if (await this.users.existsBy({ email })) throw new ConflictException(DUPLICATE_EMAIL);
    const user = this.users.create({
      email,
      name: dto.name,
      role: dto.role,
      unitSystem: dto.unitSystem ?? 'SI',
      active: true,
      mustChangePassword: false,
      passwordHash: await this.passwords.hash(dto.password),
    });
    try {
      return await this.users.save(user);
    } catch (error) {
      // Two creations of the same email at once: the unique index decides.
      if (isUniqueViolation(error)) throw new ConflictException(DUPLICATE_EMAIL);
      throw error;
    }
  }

  /** An admin's change to a user; an admin cannot lock themselves out. */
  async update(actor: User, id: number, dto: UpdateUserDto): Promise<User> {
    const user = await this.findOne(id);
    if (actor.id === user.id) {
      if (dto.active === false) throw new ConflictException('You cannot deactivate your own account');
      if (dto.role !== undefined && dto.role !== 'admin') {
        throw new ConflictException('You cannot remove your own admin role');
      }
    }
    this.users.merge(user, sentOnly(dto));
    return this.users.save(user);
  }

  /** DELETE deactivates: rows are kept for the history they appear in. */
  async deactivate(actor: User, id: number): Promise<User> {
    if (actor.id === id) throw new ConflictException('You cannot deactivate your own account');
    const user = await this.findOne(id);
    user.active = false;
    return this.users.save(user);
  }

  async updateProfile(user: User, dto: UpdateProfileDto): Promise<User> {
    this.users.merge(user, sentOnly({ name: dto.name, unitSystem: dto.unitSystem }));
    return this.users.save(user);
  }

  /** Changes one's own password (which also ends a temporary one). */
  async changePassword(user: User, dto: ChangePasswordDto): Promise<void> {
    if (!(await this.passwords.verify(dto.currentPassword, user.passwordHash))) {
      throw new BadRequestException('Current password is incorrect');
    }
    if (dto.newPassword === dto.currentPassword) throw new BadRequestException('Choose a new password that differs from the current one');
    await this.setPassword(user, dto.newPassword, false);
  }

  /** An admin sets a temporary password: its owner must choose a new one at their next sign-in. */
  async setTemporaryPassword(id: number, password: string): Promise<User> {
    const user = await this.findOne(id);
    await this.setPassword(user, password, true);
    return user;
  }

  hashPassword(password: string): Promise<string> {
    return this.passwords.hash(password);
  }

  /** Sets a password (checked, hashed); `temporary`: to be changed at the next sign-in. */
  async setPassword(user: User, password: string, temporary: boolean): Promise<void> {
    this.assertAcceptablePassword(password);
    user.passwordHash = await this.passwords.hash(password);
    user.mustChangePassword = temporary;
    await this.users.save(user);
  }

  /** Length is checked by the DTOs; the demo password is refused outside demo mode. */
  assertAcceptablePassword(password: string): void {
    if (!this.config.demo && password === DEMO_PASSWORD) {
      throw new BadRequestException('The demo password cannot be used here; choose another one');
    }
  }
}
