import { newPassword as contractNewPassword } from '@hoopline/contract';
import * as yup from 'yup';
import { ruleOf } from '../../lib/contract-rules';

/** The new-password rule: the API's own (the contract's newPassword), shown as people type. */
export const newPassword = yup
  .string()
  .required('Choose a password')
  .test('contract', ruleOf(contractNewPassword, 'The password'));

export const confirmPassword = (field = 'password') =>
  yup
    .string()
    .required('Repeat the password')
    .oneOf([yup.ref(field)], 'The two passwords are not the same');
