import { applyDecorators } from '@nestjs/common';
import { Transform } from 'class-transformer';
import { IsEmail, IsNotEmpty, IsString, Matches, MaxLength } from 'class-validator';
import { MOUNT_LIMITS } from '../../catalog/mount-rules.js';

export const SUPPLIER_NAME_MAX_LENGTH = MOUNT_LIMITS.supplierNameMaxLength;
export const CONTACT_EMAIL_MAX_LENGTH = 200;
export const PHONE_MAX_LENGTH = 40;
export const NOTES_MAX_LENGTH = 2000;

const trim = () => Transform(({ value }) => (typeof value === 'string' ? value.trim() : value));
/** Trimmed; an empty string clears the field (null). */
const trimToNull = () => Transform(({ value }) => (typeof value === 'string' ? value.trim() || null : value));

export const SupplierName = () =>
  applyDecorators(
    trim(),
    IsString(),
    IsNotEmpty(),
    MaxLength(SUPPLIER_NAME_MAX_LENGTH),
    // eslint-disable-next-line no-control-regex -- the pattern is there to refuse control characters
    Matches(/^[^\u0000-\u001F\u007F]*$/, { message: 'name must be one line of text' }),
  );

export const ContactEmail = () => applyDecorators(trimToNull(), IsEmail(), MaxLength(CONTACT_EMAIL_MAX_LENGTH));

export const Phone = () =>
  applyDecorators(
    trimToNull(),
    IsString(),
    MaxLength(PHONE_MAX_LENGTH),
    Matches(/^[0-9A-Za-z+()./\- ]+$/, { message: 'phone may hold digits, letters, spaces and + ( ) . / -' }),
  );

export const Notes = () => applyDecorators(trimToNull(), IsString(), MaxLength(NOTES_MAX_LENGTH));
