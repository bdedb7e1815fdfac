import * as yup from 'yup';

export const signInSchema = yup.object({
  email: yup.string().trim().required('Enter your email address').email('Enter a valid email address, like name@example.com'),
  password: yup.string().required('Enter your password'),
});

export type SignInValues = yup.InferType<typeof signInSchema>;
