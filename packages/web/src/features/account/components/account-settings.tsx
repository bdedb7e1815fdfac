import { Card } from '@blueprintjs/core';

import { PageHeader } from '@/components/page-header';

import { ChangePasswordForm } from './change-password-form';
import { ProfileForm } from './profile-form';
import { UnitsPreview } from './units-preview';

/** The Account page: the signed-in user's own name, units and password. */
export function AccountSettings() {
  return (
    <>
      <PageHeader title="Your account" description="Your name, the units you work in, and your password." />
      <div className="tc-account-grid">
        <Card className="tc-card" aria-labelledby="tc-account-profile">
          <h2 className="tc-card-title" id="tc-account-profile">
            Profile
          </h2>
          <ProfileForm />
          <UnitsPreview />
        </Card>
        <Card className="tc-card" aria-labelledby="tc-account-password">
          <h2 className="tc-card-title" id="tc-account-password">
            Password
          </h2>
          <ChangePasswordForm />
        </Card>
      </div>
    </>
  );
}
