import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC_KEY = 'tacet:isPublic';

/** Opts a route (or a controller) out of the global sign-in requirement. */
export const Public = () => SetMetadata(IS_PUBLIC_KEY, true);
