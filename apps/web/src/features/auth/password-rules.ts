import * as yup from 'yup';

/** The new-password rule shown to people; the server enforces its own as well. */
export const newPassword = yup
  .string()
  .required('Choose a password')
  .min(10, 'Use at least 10 characters')
  .max(200, 'Use at most 200 characters');

export const confirmPassword = (field = 'password') =>
  yup
    .string()
    .required('Repeat the password')
    .oneOf([yup.ref(field)], 'The two passwords are not the same');
