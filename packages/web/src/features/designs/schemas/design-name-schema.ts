import * as yup from 'yup';

export const DESIGN_NAME_MAX_LENGTH = 120;

export const createDesignSchema = yup.object({
  name: yup
    .string()
    .trim()
    .required('Give the design a name, e.g. the machine it is for')
    .max(DESIGN_NAME_MAX_LENGTH, `Keep the name to ${DESIGN_NAME_MAX_LENGTH} characters or fewer`),
});

export type CreateDesignValues = yup.InferType<typeof createDesignSchema>;
