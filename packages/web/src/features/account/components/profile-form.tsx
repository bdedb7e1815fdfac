import { Button, Callout, FormGroup, Radio, RadioGroup } from '@blueprintjs/core';
import type { UnitSystem } from '@tacet/vibration';
import { Form, Formik, useField, type FormikHelpers } from 'formik';
import { useState } from 'react';

import { FormError } from '@/components/form/form-error';
import { TextField } from '@/components/form/text-field';
import { formFailure } from '@/lib/api-errors';
import { useUser } from '@/lib/auth';
import { ROLE_LABELS } from '@/lib/authorization';

import { useUpdateProfile, type UpdateProfileInput } from '../api/update-profile';
import { profileSchema, type ProfileValues } from '../schemas/account-schemas';

function UnitSystemField() {
  const [field, , helpers] = useField<UnitSystem>('unitSystem');
  return (
    <FormGroup>
      <RadioGroup
        label="Units"
        name="unitSystem"
        selectedValue={field.value}
        onChange={(event) => void helpers.setValue(event.currentTarget.value as UnitSystem)}
      >
        <Radio value="SI" label="SI — kg, N, mm, N/mm, °C" />
        <Radio value="US" label="US customary — lb, lbf, in, lbf/in, °F" />
      </RadioGroup>
    </FormGroup>
  );
}

/** Name and unit preference of the signed-in user (`PATCH /api/auth/me`). */
export function ProfileForm() {
  const user = useUser();
  const updateProfile = useUpdateProfile();
  const [failure, setFailure] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);

  const submit = async (values: ProfileValues, helpers: FormikHelpers<ProfileValues>) => {
    setFailure(null);
    setSaved(false);
    const changes: UpdateProfileInput = {};
    const name = values.name.trim();
    if (name !== user.name) changes.name = name;
    if (values.unitSystem !== user.unitSystem) changes.unitSystem = values.unitSystem;
    try {
      if (Object.keys(changes).length > 0) await updateProfile.mutateAsync(changes);
      setSaved(true);
      helpers.resetForm({ values: { name, unitSystem: values.unitSystem } });
    } catch (error) {
      const { fields, general } = formFailure(error, ['name']);
      helpers.setErrors(fields);
      setFailure(general);
    }
  };

  return (
    <Formik<ProfileValues>
      initialValues={{ name: user.name, unitSystem: user.unitSystem }}
      validationSchema={profileSchema}
      onSubmit={submit}
    >
      {({ isSubmitting, dirty }) => (
        <Form noValidate aria-label="Profile">
          <dl className="tc-facts">
            <dt>Email</dt>
            <dd>{user.email}</dd>
            <dt>Role</dt>
            <dd>{ROLE_LABELS[user.role]}</dd>
          </dl>
          <TextField name="name" id="profile-name" label="Name" autoComplete="name" />
          <UnitSystemField />
          <FormError message={failure} />
          {saved && !dirty ? (
            <Callout intent="success" className="tc-form-success" role="status">
              Your profile is saved.
            </Callout>
          ) : null}
          <Button type="submit" intent="primary" text="Save profile" loading={isSubmitting} />
        </Form>
      )}
    </Formik>
  );
}
