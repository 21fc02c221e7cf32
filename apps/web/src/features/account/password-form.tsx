import { Form, Formik } from 'formik';
import { useState } from 'react';
import * as yup from 'yup';
import { ApiError } from '../../api/client';
import { useChangePassword } from '../../api/session';
import { Button } from '../../components/button';
import { FormError, FormikTextField } from '../../components/field';
import { serverFieldErrors } from '../../components/server-errors';
import { confirmPassword, newPassword } from '../auth/password-rules';

export function PasswordForm() {
  const change = useChangePassword();
  const [message, setMessage] = useState<string | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  return (
    <Formik
      initialValues={{ currentPassword: '', newPassword: '', confirm: '' }}
      validationSchema={yup.object({
        currentPassword: yup.string().required('Enter your current password'),
        newPassword,
        confirm: confirmPassword('newPassword'),
      })}
      onSubmit={async (values, helpers) => {
        setFormError(null);
        setMessage(null);
        try {
          await change.mutateAsync({
            currentPassword: values.currentPassword,
            newPassword: values.newPassword,
          });
          helpers.resetForm();
          setMessage('Password changed.');
        } catch (error) {
          if (error instanceof ApiError && error.status === 403) {
            helpers.setErrors({ currentPassword: 'This is not your current password' });
            return;
          }
          const mapped = serverFieldErrors(error, ['currentPassword', 'newPassword']);
          helpers.setErrors(mapped.fields);
          setFormError(mapped.message);
        }
      }}
    >
      {({ isSubmitting }) => (
        <Form noValidate className="flex max-w-sm flex-col gap-3">
          <FormError message={formError} />
          {message ? (
            <p role="status" className="text-sm text-pass">
              {message}
            </p>
          ) : null}
          <FormikTextField
            name="currentPassword"
            type="password"
            label="Current password"
            autoComplete="current-password"
          />
          <FormikTextField
            name="newPassword"
            type="password"
            label="New password"
            autoComplete="new-password"
            hint="At least 10 characters."
          />
          <FormikTextField
            name="confirm"
            type="password"
            label="Repeat the new password"
            autoComplete="new-password"
          />
          <div>
            <Button type="submit" variant="primary" busy={isSubmitting}>
              Change password
            </Button>
          </div>
        </Form>
      )}
    </Formik>
  );
}
