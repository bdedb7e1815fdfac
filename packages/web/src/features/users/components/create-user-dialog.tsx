import { Button, Dialog, DialogBody, DialogFooter } from '@blueprintjs/core';
import { Form, Formik, type FormikHelpers } from 'formik';
import { useState } from 'react';

import { FormError } from '@/components/form/form-error';
import { SelectField } from '@/components/form/select-field';
import { TextField } from '@/components/form/text-field';
import { formFailure } from '@/lib/api-errors';

import { useCreateUser } from '../api/create-user';
import { createUserSchema, PASSWORD_MIN_LENGTH, type CreateUserValues } from '../schemas/user-schemas';
import type { User } from '../types';
import { ROLE_OPTIONS, UNIT_OPTIONS } from './role-options';

const INITIAL_VALUES: CreateUserValues = { email: '', name: '', role: 'engineer', unitSystem: 'SI', password: '' };

export interface CreateUserDialogProps {
  isOpen: boolean;
  onClose: () => void;
  onCreated?: (user: User) => void;
}

export function CreateUserDialog({ isOpen, onClose, onCreated }: CreateUserDialogProps) {
  const createUser = useCreateUser();
  const [failure, setFailure] = useState<string | null>(null);

  const close = () => {
    setFailure(null);
    onClose();
  };

  const submit = async (values: CreateUserValues, helpers: FormikHelpers<CreateUserValues>) => {
    setFailure(null);
    try {
      const user = await createUser.mutateAsync({
        email: values.email.trim(),
        name: values.name.trim(),
        role: values.role,
        unitSystem: values.unitSystem,
        password: values.password,
      });
      onCreated?.(user);
      close();
    } catch (error) {
      const { fields, general } = formFailure(error, ['email', 'name', 'role', 'unitSystem', 'password']);
      helpers.setErrors(fields);
      setFailure(general);
    }
  };

  return (
    <Dialog title="Add a person" isOpen={isOpen} onClose={close} className="tc-dialog">
      <Formik<CreateUserValues> initialValues={INITIAL_VALUES} validationSchema={createUserSchema} onSubmit={submit}>
        {({ isSubmitting }) => (
          <Form noValidate aria-label="Add a person">
            <DialogBody>
              <TextField name="email" id="new-user-email" label="Email" type="email" autoComplete="off" autoFocus />
              <TextField name="name" id="new-user-name" label="Name" autoComplete="off" />
              <SelectField name="role" id="new-user-role" label="Role" options={ROLE_OPTIONS} />
              <SelectField name="unitSystem" id="new-user-units" label="Units" options={UNIT_OPTIONS} />
              <TextField
                name="password"
                id="new-user-password"
                label="Initial password"
                type="password"
                autoComplete="new-password"
                helperText={`At least ${PASSWORD_MIN_LENGTH} characters. Pass it on privately; the person can change it under Account.`}
              />
              <FormError message={failure} />
            </DialogBody>
            <DialogFooter
              actions={
                <>
                  <Button text="Cancel" onClick={close} disabled={isSubmitting} />
                  <Button type="submit" intent="primary" text="Add person" loading={isSubmitting} />
                </>
              }
            />
          </Form>
        )}
      </Formik>
    </Dialog>
  );
}
