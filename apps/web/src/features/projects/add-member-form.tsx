import { Form, Formik } from 'formik';
import { useState } from 'react';
import * as yup from 'yup';
import { useUsers } from '../../api/admin';
import { useSetMember } from '../../api/projects';
import type { Member, Role } from '../../api/types';
import { Button } from '../../components/button';
import { FormError, FormikSelectField } from '../../components/field';
import { serverFieldErrors } from '../../components/server-errors';

const schema = yup.object({
  userId: yup.string().required('Choose a person'),
  role: yup.string().oneOf(['designer', 'checker', 'fabricator']).required('Choose a role'),
});

/** Adding someone needs the people list, which the API gives to admins only (GET /users). */
export function AddMemberForm({
  projectId,
  members,
}: {
  projectId: string;
  members: readonly Member[];
}) {
  const users = useUsers({ pageSize: 100 });
  const setMember = useSetMember(projectId);
  const [formError, setFormError] = useState<string | null>(null);
  const memberIds = new Set(members.map((m) => m.user.id));
  const candidates = (users.data?.items ?? []).filter((u) => u.active && !memberIds.has(u.id));
  return (
    <Formik
      initialValues={{ userId: '', role: 'designer' as Role }}
      validationSchema={schema}
      onSubmit={async (values, helpers) => {
        setFormError(null);
        try {
          await setMember.mutateAsync({ userId: values.userId, role: values.role });
          helpers.resetForm();
        } catch (error) {
          const mapped = serverFieldErrors(error, ['userId', 'role']);
          helpers.setErrors(mapped.fields);
          setFormError(mapped.message);
        }
      }}
    >
      {({ isSubmitting }) => (
        <Form noValidate className="flex flex-wrap items-end gap-3">
          <FormError message={formError} />
          <FormikSelectField name="userId" label="Person" className="min-w-64">
            <option value="">{users.isPending ? 'Loading people…' : 'Choose a person'}</option>
            {candidates.map((u) => (
              <option key={u.id} value={u.id}>
                {u.name} ({u.email})
              </option>
            ))}
          </FormikSelectField>
          <FormikSelectField name="role" label="Role">
            <option value="designer">Designer</option>
            <option value="checker">Checker</option>
            <option value="fabricator">Fabricator</option>
          </FormikSelectField>
          <Button type="submit" variant="primary" busy={isSubmitting}>
            Add member
          </Button>
        </Form>
      )}
    </Formik>
  );
}
