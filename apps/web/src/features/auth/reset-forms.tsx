import { Form, Formik } from 'formik';
import { useState } from 'react';
import * as yup from 'yup';
import { ApiError } from '../../api/client';
import { useCompletePasswordReset, useRequestPasswordReset } from '../../api/session';
import { Button } from '../../components/button';
import { FormError, FormikTextField } from '../../components/field';
import { serverFieldErrors } from '../../components/server-errors';
import { confirmPassword, newPassword } from './password-rules';

export function RequestResetForm({ onSent }: { onSent: () => void }) {
  const request = useRequestPasswordReset();
  const [formError, setFormError] = useState<string | null>(null);
  return (
    <Formik
      initialValues={{ email: '' }}
      validationSchema={yup.object({
        email: yup
          .string()
          .trim()
          .email('Enter an e-mail address such as name@example.com')
          .required('Enter your e-mail address'),
      })}
      onSubmit={async (values, helpers) => {
        setFormError(null);
        try {
          await request.mutateAsync({ email: values.email.trim() });
          onSent();
        } catch (error) {
          const mapped = serverFieldErrors(error, ['email']);
          helpers.setErrors(mapped.fields);
          setFormError(mapped.message);
        }
      }}
    >
      {({ isSubmitting }) => (
        <Form noValidate className="flex flex-col gap-3">
          <FormError message={formError} />
          <FormikTextField
            name="email"
            type="email"
            label="E-mail"
            autoComplete="username"
            required
          />
          <Button type="submit" variant="primary" busy={isSubmitting}>
            Send reset instructions
          </Button>
        </Form>
      )}
    </Formik>
  );
}

export function CompleteResetForm({ token, onDone }: { token: string; onDone: () => void }) {
  const complete = useCompletePasswordReset();
  const [formError, setFormError] = useState<string | null>(null);
  return (
    <Formik
      initialValues={{ password: '', confirm: '' }}
      validationSchema={yup.object({ password: newPassword, confirm: confirmPassword() })}
      onSubmit={async (values, helpers) => {
        setFormError(null);
        try {
          await complete.mutateAsync({ token, password: values.password });
          onDone();
        } catch (error) {
          if (error instanceof ApiError && error.status === 404) {
            setFormError('This reset link has been used or has expired. Ask for a new one.');
            return;
          }
          const mapped = serverFieldErrors(error, ['password']);
          helpers.setErrors(mapped.fields);
          setFormError(mapped.message);
        }
      }}
    >
      {({ isSubmitting }) => (
        <Form noValidate className="flex flex-col gap-3">
          <FormError message={formError} />
          <FormikTextField
            name="password"
            type="password"
            label="New password"
            autoComplete="new-password"
            hint="At least 10 characters."
            required
          />
          <FormikTextField
            name="confirm"
            type="password"
            label="Repeat the new password"
            autoComplete="new-password"
            required
          />
          <Button type="submit" variant="primary" busy={isSubmitting}>
            Set the new password
          </Button>
        </Form>
      )}
    </Formik>
  );
}
