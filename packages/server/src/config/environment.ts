import 'reflect-metadata';
import { Transform, Type, plainToInstance } from 'class-transformer';
import {
  IsBoolean,
  IsDefined,
  IsEmail,
  IsInt,
  IsOptional,
  IsString,
  Matches,
  Max,
  Min,
  MinLength,
  NotEquals,
  ValidateIf,
  validateSync,
  type ValidationError,
} from 'class-validator';

/** The demo accounts' password; refused everywhere outside demo mode. */
export const DEMO_PASSWORD = 'tacet-demo';

/** Minimum length of every user password (the demo password has exactly this length). */
export const PASSWORD_MIN_LENGTH = 10;

/** The sender used when MAIL_FROM is not set. */
export const DEFAULT_MAIL_FROM = 'Tacet <no-reply@tacet.test>';

/** `local@domain` or `Display name <local@domain>` (no line breaks, so no header injection). */
const MAILBOX = /^(?:[^<>\r\n]*<[^\s<>@]+@[^\s<>@]+\.[^\s<>@]+>|[^\s<>@]+@[^\s<>@]+\.[^\s<>@]+)$/;

const toBoolean = ({ value }: { value: unknown }): unknown => {
  if (value === 'true') return true;
  if (value === 'false') return false;
  return value;
};

/**
 * The process environment as the server reads it, validated at boot. Each property is one
 * variable; a failing rule stops the boot with the variable's name in the message. Only the
 * first failing rule of a variable is reported; class-validator checks a property's
 * decorators bottom-up, so the type check sits last.
 */
export class EnvironmentVariables {
  @IsOptional()
  @Type(() => Number)
  @Min(0)
  @Max(65535)
  @IsInt({ message: 'PORT must be an integer' })
  PORT: number = 3000;

  @IsOptional()
  @IsString()
  TACET_DATA_DIR: string = './data';

  @IsOptional()
  @Transform(toBoolean)
  @IsBoolean({ message: 'TACET_DEMO must be true or false' })
  TACET_DEMO: boolean = false;

  @ValidateIf((env: EnvironmentVariables) => !env.TACET_DEMO || env.JWT_SECRET !== undefined)
  @IsDefined({ message: 'JWT_SECRET is required outside demo mode (a random string of at least 32 characters)' })
  @MinLength(32, { message: 'JWT_SECRET must be at least 32 characters long' })
  @IsString()
  JWT_SECRET?: string;

  @IsOptional()
  @Matches(/^smtps?:\/\/\S+$/, { message: 'SMTP_URL must be an smtp:// or smtps:// URL' })
  SMTP_URL?: string;

  @IsOptional()
  @Matches(/^postgres(ql)?:\/\/\S+$/, { message: 'DATABASE_URL must be a postgres:// URL' })
  DATABASE_URL?: string;

  @IsOptional()
  @Type(() => Number)
  @Min(1)
  @Max(100000)
  @IsInt({ message: 'TACET_LOGIN_LIMIT_PER_MINUTE must be an integer' })
  TACET_LOGIN_LIMIT_PER_MINUTE: number = 20;

  /**
   * Proxies (load balancers) in front of the server whose X-Forwarded-For is believed: the
   * client address (for the sign-in limit) is then the one the nearest of them saw. 0: none,
   * the connection's own address counts (a client cannot pick its address).
   */
  @IsOptional()
  @Type(() => Number)
  @Min(0)
  @Max(10)
  @IsInt({ message: 'TACET_TRUST_PROXY must be an integer (the number of proxies in front of the server)' })
  TACET_TRUST_PROXY: number = 0;

  @ValidateIf((env: EnvironmentVariables) => !env.TACET_DEMO && env.TACET_ADMIN_PASSWORD !== undefined)
  @Transform(({ value }) => (typeof value === 'string' ? value.trim() : value))
  @IsDefined({ message: 'TACET_ADMIN_EMAIL is required when TACET_ADMIN_PASSWORD is set' })
  @IsEmail({}, { message: 'TACET_ADMIN_EMAIL must be an email address' })
  TACET_ADMIN_EMAIL?: string;

  @ValidateIf((env: EnvironmentVariables) => !env.TACET_DEMO && env.TACET_ADMIN_EMAIL !== undefined)
  @IsDefined({ message: 'TACET_ADMIN_PASSWORD is required when TACET_ADMIN_EMAIL is set' })
  @NotEquals(DEMO_PASSWORD, { message: 'TACET_ADMIN_PASSWORD must not be the demo password' })
  @MinLength(PASSWORD_MIN_LENGTH, {
    message: `TACET_ADMIN_PASSWORD must be at least ${PASSWORD_MIN_LENGTH} characters long`,
  })
  @IsString()
  TACET_ADMIN_PASSWORD?: string;

  @IsOptional()
  @IsString()
  TACET_WEB_DIST?: string;

  /** Sender of every e-mail Tacet sends: `Name <address>` or a bare address. */
  @IsOptional()
  @Matches(MAILBOX, { message: 'MAIL_FROM must be an address such as "Tacet <no-reply@example.com>"' })
  MAIL_FROM: string = DEFAULT_MAIL_FROM;

  /**
   * The address people use to open Tacet (scheme, host, port, optional path), put into the links
   * of every e-mail. Default: `http://localhost:<PORT>`.
   */
  @IsOptional()
  @Matches(/^https?:\/\/[^\s/?#]+(\/[^\s?#]*)?$/, {
    message: 'TACET_PUBLIC_URL must be the http:// or https:// address people open Tacet at, such as https://tacet.example.com',
  })
  TACET_PUBLIC_URL?: string;

  /** Read only to recognise a test run (`test` keeps the local mail catcher on, like demo mode). */
  @IsOptional()
  @IsString()
  NODE_ENV?: string;
}

/** Thrown when the environment is not usable; its message lists every problem. */
export class ConfigError extends Error {
  constructor(readonly problems: string[]) {
    super(`Invalid configuration:\n${problems.map((p) => `  - ${p}`).join('\n')}`);
    this.name = 'ConfigError';
  }
}

function messages(errors: ValidationError[]): string[] {
  return errors.flatMap((error) => Object.values(error.constraints ?? {}));
}

/**
 * Validates the raw environment (empty strings count as unset) and returns it typed,
 * with defaults applied. Throws a ConfigError listing every problem.
 */
export function validateEnvironment(raw: Record<string, string | undefined>): EnvironmentVariables {
  const present = Object.fromEntries(Object.entries(raw).filter(([, value]) => value !== undefined && value !== ''));
  const env = plainToInstance(EnvironmentVariables, present);
  const errors = validateSync(env, { stopAtFirstError: true });
  if (errors.length > 0) throw new ConfigError(messages(errors));
  return env;
}
