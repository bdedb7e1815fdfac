import * as yup from 'yup';

export const PROJECT_NAME_MAX_LENGTH = 120;
export const PROJECT_TEXT_MAX_LENGTH = 120;
export const PROJECT_DESCRIPTION_MAX_LENGTH = 2000;

const optionalText = (label: string, max: number) =>
  yup.string().trim().max(max, `Keep the ${label} to ${max} characters or fewer`).default('');

export const createProjectSchema = yup.object({
  name: yup
    .string()
    .trim()
    .required('Give the project a name')
    .max(PROJECT_NAME_MAX_LENGTH, `Keep the name to ${PROJECT_NAME_MAX_LENGTH} characters or fewer`),
  site: optionalText('site', PROJECT_TEXT_MAX_LENGTH),
  client: optionalText('client', PROJECT_TEXT_MAX_LENGTH),
  description: optionalText('description', PROJECT_DESCRIPTION_MAX_LENGTH),
});

export type CreateProjectValues = yup.InferType<typeof createProjectSchema>;
