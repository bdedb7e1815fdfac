import { SetMetadata } from '@nestjs/common';

export const ALLOW_TEMPORARY_PASSWORD_KEY = 'tacet:allowTemporaryPassword';

/** A route someone signed in with a temporary password may still use (reading their account, choosing a new password). */
export const AllowTemporaryPassword = () => SetMetadata(ALLOW_TEMPORARY_PASSWORD_KEY, true);
