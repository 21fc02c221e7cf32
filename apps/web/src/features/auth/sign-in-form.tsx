import { Form, Formik } from 'formik';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import * as yup from 'yup';
import { ApiError } from '../../api/client';
import { useSignIn } from '../../api/session';
import type { Me } from '@hoopline/contract';
import { Button } from '../../components/button';
import { FormError, FormikTextField } from '../../components/field';
import { serverFieldErrors } from '../../components/server-errors';

const schema = yup.object({
  email: yup
    .string()
    .trim()
    .email('Enter an e-mail address such as name@example.com')
    .required('Enter your e-mail address'),
  password: yup.string().required('Enter your password'),
});

export function SignInForm({ onSignedIn }: { onSignedIn: (me: Me) => void }) {
  const signIn = useSignIn();
  const [formError, setFormError] = useState<string | null>(null);
  return (
    <Formik
      initialValues={{ email: '', password: '' }}
      validationSchema={schema}
      onSubmit={async (values, helpers) => {
        setFormError(null);
        try {
          const me = await signIn.mutateAsync({
            email: values.email.trim(),
            password: values.password,
          });
          onSignedIn(me);
        } catch (error) {
          if (error instanceof ApiError && error.status === 401) {
            setFormError('The e-mail address or password is not right.');
            return;
          }
          const mapped = serverFieldErrors(error, ['email', 'password']);
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
          <FormikTextField
            name="password"
            type="password"
            label="Password"
            autoComplete="current-password"
            required
          />
          <Button type="submit" variant="primary" busy={isSubmitting}>
            Sign in
          </Button>
          <Link
            to="/reset-password"
            className="text-center text-xs text-muted hover:text-ink hover:underline"
          >
            Forgot your password?
          </Link>
        </Form>
      )}
    </Formik>
  );
}
