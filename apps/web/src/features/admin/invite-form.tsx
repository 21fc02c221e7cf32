import { Form, Formik } from 'formik';
import { useState } from 'react';
import * as yup from 'yup';
import { contractText } from '../../lib/contract-rules';
import { inviteBody } from '@hoopline/contract';
import { useCreateInvitation } from '../../api/admin';
import { Button } from '../../components/button';
import { FormError, FormikTextField } from '../../components/field';
import { serverFieldErrors } from '../../components/server-errors';
import { Field } from 'formik';
import { invitationDelivery, type Delivery } from './delivery-notice';

const schema = yup.object({
  email: yup
    .string()
    .trim()
    .email('Enter an e-mail address such as name@example.com')
    .required('Enter their e-mail address'),
  name: contractText(inviteBody.shape.name, 'The name', 'Enter their name'),
  isAdmin: yup.boolean(),
});

/** Sends an invitation; the page says whether it was mailed or shows the link to pass on. */
export function InviteForm({ onInvited }: { onInvited: (delivery: Delivery) => void }) {
  const create = useCreateInvitation();
  const [formError, setFormError] = useState<string | null>(null);
  return (
    <Formik
      initialValues={{ email: '', name: '', isAdmin: false }}
      validationSchema={schema}
      onSubmit={async (values, helpers) => {
        setFormError(null);
        try {
          const result = await create.mutateAsync({
            email: values.email.trim(),
            name: values.name.trim(),
            isAdmin: values.isAdmin,
          });
          onInvited(invitationDelivery(result, values.email.trim()));
          helpers.resetForm();
        } catch (error) {
          const mapped = serverFieldErrors(error, ['email', 'name', 'isAdmin']);
          helpers.setErrors(mapped.fields);
          setFormError(mapped.message);
        }
      }}
    >
      {({ isSubmitting }) => (
        <Form noValidate className="flex flex-col gap-3">
          <FormError message={formError} />
          <div className="grid gap-3 sm:grid-cols-2">
            <FormikTextField name="email" type="email" label="E-mail" required />
            <FormikTextField name="name" label="Name" required />
          </div>
          <label className="flex items-center gap-2 text-sm">
            <Field type="checkbox" name="isAdmin" className="h-4 w-4 accent-accent" />
            Administrator (manages people, invitations and the audit log; never signs)
          </label>
          <div>
            <Button type="submit" variant="primary" busy={isSubmitting}>
              Send invitation
            </Button>
          </div>
        </Form>
      )}
    </Formik>
  );
}
