import type { AppConfig } from './app-config.js';

/**
 * Links into the web app for e-mails, built on TACET_PUBLIC_URL (the routes of
 * `packages/web/src/app/router.tsx`).
 */
export const publicLinks = (config: Pick<AppConfig, 'publicUrl'>) => ({
  design: (designId: number) => `${config.publicUrl}/designs/${designId}`,
  purchasing: (designId: number) => `${config.publicUrl}/purchasing/designs/${designId}`,
  passwordReset: (token: string) => `${config.publicUrl}/reset-password?token=${encodeURIComponent(token)}`,
  signIn: () => `${config.publicUrl}/sign-in`,
});
