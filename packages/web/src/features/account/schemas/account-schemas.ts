import type { UnitSystem } from '@tacet/vibration';
import * as yup from 'yup';

import { NAME_MAX_LENGTH, PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '@/lib/account-rules';

export { PASSWORD_MIN_LENGTH };

export const profileSchema = yup.object({
  name: yup.string().trim().required('Enter your name').max(NAME_MAX_LENGTH, `Keep your name to ${NAME_MAX_LENGTH} characters or fewer`),
  unitSystem: yup.mixed<UnitSystem>().oneOf(['SI', 'US'], 'Choose SI or US customary').required(),
});

export type ProfileValues = yup.InferType<typeof profileSchema>;

export const changePasswordSchema = yup.object({
  currentPassword: yup.string().required('Enter your current password'),
  newPassword: yup
    .string()
    .required('Enter a new password')
    .min(PASSWORD_MIN_LENGTH, `The new password needs at least ${PASSWORD_MIN_LENGTH} characters`)
    .max(PASSWORD_MAX_LENGTH, `Keep the password to ${PASSWORD_MAX_LENGTH} characters or fewer`)
    .notOneOf([yup.ref('currentPassword')], 'Choose a password different from the current one'),
  confirmPassword: yup
    .string()
    .required('Type the new password again')
    .oneOf([yup.ref('newPassword')], 'The two new passwords do not match'),
});

export type ChangePasswordValues = yup.InferType<typeof changePasswordSchema>;
