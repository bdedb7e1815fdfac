import * as yup from 'yup';

import { NAME_MAX_LENGTH, PASSWORD_MAX_LENGTH, PASSWORD_MIN_LENGTH } from '@/lib/account-rules';
import { ROLES, type Role } from '@/lib/authorization';
import type { UnitSystem } from '@tacet/vibration';

export { PASSWORD_MIN_LENGTH };

const UNIT_SYSTEMS: readonly UnitSystem[] = ['SI', 'US'];

const name = yup
  .string()
  .trim()
  .required('Enter the person’s name')
  .max(NAME_MAX_LENGTH, `Keep the name to ${NAME_MAX_LENGTH} characters or fewer`);
const role = yup.mixed<Role>().oneOf(ROLES, 'Choose a role').required('Choose a role');
const unitSystem = yup.mixed<UnitSystem>().oneOf(UNIT_SYSTEMS, 'Choose SI or US customary').required();

export const createUserSchema = yup.object({
  email: yup.string().trim().required('Enter an email address').email('Enter a valid email address, like name@example.com'),
  name,
  role,
  unitSystem,
  password: yup
    .string()
    .required('Enter an initial password')
    .min(PASSWORD_MIN_LENGTH, `The initial password needs at least ${PASSWORD_MIN_LENGTH} characters`)
    .max(PASSWORD_MAX_LENGTH, `Keep the password to ${PASSWORD_MAX_LENGTH} characters or fewer`),
});

export type CreateUserValues = yup.InferType<typeof createUserSchema>;

export const editUserSchema = yup.object({
  name,
  role,
  unitSystem,
  active: yup.boolean().required(),
});

export type EditUserValues = yup.InferType<typeof editUserSchema>;
