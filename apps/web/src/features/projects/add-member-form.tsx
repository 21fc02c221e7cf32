import { Form, Formik } from 'formik';
import { useId, useState } from 'react';
import * as yup from 'yup';
import { ROLES } from '@hoopline/contract';
import { useUsers } from '../../api/admin';
import { ApiError } from '../../api/client';
import { lookUpUser, useSetMember } from '../../api/projects';
import { useMe } from '../../api/session';
import { OWN_CHECKER_ROLE } from '@hoopline/present';
import type { Member, Role } from '@hoopline/contract';
import { ROLE_LABEL } from '../../components/badges';
import { Button } from '../../components/button';
import { FormError, FormikSelectField, FormikTextField } from '../../components/field';
import { serverFieldErrors } from '../../components/server-errors';

const schema = yup.object({
  email: yup
    .string()
    .trim()
    .email('Enter an e-mail address such as name@example.com')
    .required('Enter the e-mail address they sign in with'),
  role: yup.string().oneOf(ROLES).required('Choose a role'),
});

export interface PersonSuggestion {
  readonly email: string;
  readonly name: string;
}

/**
 * Adds a person by the exact e-mail address they sign in with
 * (GET /users/lookup, for designers and admins): nobody but an admin can list
 * people, so a designer must know the address.
 */
export function AddMemberForm({
  projectId,
  members,
  suggestions = [],
}: {
  projectId: string;
  members: readonly Member[];
  /** Addresses offered while typing (an admin's list of people); a designer gets none. */
  suggestions?: readonly PersonSuggestion[];
}) {
  const me = useMe();
  const setMember = useSetMember(projectId);
  const listId = useId();
  const [formError, setFormError] = useState<string | null>(null);
  const [added, setAdded] = useState<string | null>(null);
  return (
    <Formik
      initialValues={{ email: '', role: 'designer' as Role }}
      validationSchema={schema}
      onSubmit={async (values, helpers) => {
        setFormError(null);
        setAdded(null);
        const email = values.email.trim();
        // Nobody makes themselves a checker (the server refuses it too: 403 own_checker_role).
        if (values.role === 'checker' && email.toLowerCase() === me.user.email.toLowerCase()) {
          helpers.setFieldError('role', OWN_CHECKER_ROLE);
          return;
        }
        const existing = members.find((m) => m.user.email.toLowerCase() === email.toLowerCase());
        if (existing) {
          helpers.setFieldError(
            'email',
            `${existing.user.name} is already a member (${ROLE_LABEL[existing.role]}); change the role in the table above.`,
          );
          return;
        }
        let user;
        try {
          user = (await lookUpUser(email)).user;
        } catch (error) {
          if (error instanceof ApiError && error.status === 404) {
            helpers.setFieldError(
              'email',
              'No active Hoopline account has this address. Check the spelling, or ask an administrator to invite them.',
            );
          } else {
            const mapped = serverFieldErrors(error, ['email']);
            helpers.setErrors(mapped.fields);
            setFormError(mapped.message);
          }
          return;
        }
        try {
          await setMember.mutateAsync({ userId: user.id, role: values.role });
          helpers.resetForm();
          setAdded(`${user.name} (${user.email}) added as ${ROLE_LABEL[values.role]}.`);
        } catch (error) {
          if (error instanceof ApiError && error.code === 'own_checker_role') {
            helpers.setFieldError('role', OWN_CHECKER_ROLE);
            return;
          }
          const mapped = serverFieldErrors(error, ['role']);
          helpers.setErrors(mapped.fields);
          setFormError(mapped.message);
        }
      }}
    >
      {({ isSubmitting }) => (
        <Form noValidate className="flex flex-col gap-3">
          <FormError message={formError} />
          <div className="flex flex-wrap items-start gap-3">
            <FormikTextField
              name="email"
              type="email"
              label="E-mail address"
              hint="The exact address they sign in with."
              autoComplete="off"
              list={suggestions.length > 0 ? listId : undefined}
              className="min-w-64 flex-1"
            />
            {suggestions.length > 0 ? (
              <datalist id={listId}>
                {suggestions.map((s) => (
                  <option key={s.email} value={s.email}>
                    {s.name}
                  </option>
                ))}
              </datalist>
            ) : null}
            <FormikSelectField name="role" label="Role">
              {ROLES.map((r) => (
                <option key={r} value={r}>
                  {ROLE_LABEL[r]}
                </option>
              ))}
            </FormikSelectField>
            <Button type="submit" variant="primary" busy={isSubmitting} className="mt-5">
              Add member
            </Button>
          </div>
          {added ? (
            <p role="status" className="text-sm text-pass">
              {added}
            </p>
          ) : null}
        </Form>
      )}
    </Formik>
  );
}

/** For an admin: the same form, offering the addresses of active people not yet members. */
export function AdminAddMemberForm({
  projectId,
  members,
}: {
  projectId: string;
  members: readonly Member[];
}) {
  const users = useUsers({ pageSize: 100 });
  const memberIds = new Set(members.map((m) => m.user.id));
  const suggestions = (users.data?.items ?? [])
    .filter((u) => u.active && !memberIds.has(u.id))
    .map((u) => ({ email: u.email, name: u.name }));
  return <AddMemberForm projectId={projectId} members={members} suggestions={suggestions} />;
}
