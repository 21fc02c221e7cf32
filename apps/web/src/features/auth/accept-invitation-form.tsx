import { Form, Formik } from 'formik';
import { useState } from 'react';
import * as yup from 'yup';
import { contractText } from '../../lib/contract-rules';
import { acceptInvitationBody } from '@hoopline/contract';
import { useAcceptInvitation } from '../../api/session';
import { Button } from '../../components/button';
import { FormError, FormikTextField, TextField } from '../../components/field';
import { serverFieldErrors } from '../../components/server-errors';
import { confirmPassword, newPassword } from './password-rules';

const schema = yup.object({
  name: contractText(acceptInvitationBody.shape.name, 'Your name', 'Enter your name'),
  password: newPassword,
  confirm: confirmPassword(),
});

export function AcceptInvitationForm({
  token,
  email,
  name,
  onAccepted,
}: {
  token: string;
  email: string;
  name: string;
  onAccepted: () => void;
}) {
  const accept = useAcceptInvitation();
  const [formError, setFormError] = useState<string | null>(null);
  return (
    <Formik
      initialValues={{ name, password: '', confirm: '' }}
      validationSchema={schema}
      onSubmit={async (values, helpers) => {
        setFormError(null);
        try {
          await accept.mutateAsync({ token, name: values.name.trim(), password: values.password });
          onAccepted();
        } catch (error) {
          const mapped = serverFieldErrors(error, ['name', 'password']);
          helpers.setErrors(mapped.fields);
          setFormError(mapped.message);
        }
      }}
    >
      {({ isSubmitting }) => (
        <Form noValidate className="flex flex-col gap-3">
          <FormError message={formError} />
          <TextField label="E-mail" value={email} readOnly disabled />
          <FormikTextField name="name" label="Your name" autoComplete="name" required />
          <FormikTextField
            name="password"
            type="password"
            label="Password"
            autoComplete="new-password"
            hint="At least 10 characters."
            required
          />
          <FormikTextField
            name="confirm"
            type="password"
            label="Repeat the password"
            autoComplete="new-password"
            required
          />
          <Button type="submit" variant="primary" busy={isSubmitting}>
            Accept and sign in
          </Button>
        </Form>
      )}
    </Formik>
  );
}
