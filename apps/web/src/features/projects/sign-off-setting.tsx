import { Form, Formik, useField } from 'formik';
import { useState } from 'react';
import * as yup from 'yup';
import type { MemberList, Project } from '@hoopline/contract';
import { useUpdateProject } from '../../api/projects';
import { Button } from '../../components/button';
import { CheckboxField, FormError } from '../../components/field';
import { Panel } from '../../components/page';
import { serverFieldErrors } from '../../components/server-errors';

const schema = yup.object({ signOffPassword: yup.boolean().required() });

function PasswordCheckbox({ disabled, hint }: { disabled: boolean; hint: string }) {
  const [field, meta, helpers] = useField<boolean>('signOffPassword');
  return (
    <div className="flex flex-col gap-1">
      <CheckboxField
        name={field.name}
        checked={field.value}
        onChange={(event) => void helpers.setValue(event.target.checked)}
        onBlur={field.onBlur}
        disabled={disabled}
        label="Checkers type their password again to countersign or return"
        hint={hint}
      />
      {meta.error ? <p className="text-xs font-medium text-fail">{meta.error}</p> : null}
    </div>
  );
}

/**
 * The project's sign-off setting (issue 16.2), saved through the project
 * update on its own. Only the owner and administrators change it (the API's
 * canChangeSignOffSetting); others see it, and who can.
 */
export function SignOffSetting({
  project,
  members,
}: {
  project: Project;
  members: MemberList | undefined;
}) {
  const update = useUpdateProject(project.id);
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const canChange = members?.canManage ?? false;
  const who = members?.managers.map((m) => m.name).join(', ');
  const hint = canChange
    ? 'Off: being signed in is enough. On: the countersign and return dialogs ask for the password each checker signs in with, and a wrong one is refused and written to the audit log.'
    : `Only the project’s owner or an administrator changes this${who ? ` (${who})` : ''}.`;
  return (
    <Panel title="Sign-off" id="sign-off-setting" className="max-w-2xl">
      <Formik
        initialValues={{ signOffPassword: project.signOffPassword }}
        enableReinitialize
        validationSchema={schema}
        onSubmit={async (values, helpers) => {
          setFormError(null);
          setSaved(null);
          try {
            const answer = await update.mutateAsync({
              signOffPassword: values.signOffPassword,
              version: project.version,
            });
            setSaved(
              answer.signOffPassword
                ? 'Saved: sign-off now asks for the password.'
                : 'Saved: sign-off no longer asks for the password.',
            );
          } catch (error) {
            const mapped = serverFieldErrors(error, ['signOffPassword']);
            helpers.setErrors(mapped.fields);
            setFormError(mapped.message);
          }
        }}
      >
        {({ isSubmitting, dirty }) => (
          <Form noValidate className="flex flex-col gap-3">
            <FormError message={formError} />
            <PasswordCheckbox disabled={!canChange || isSubmitting} hint={hint} />
            {canChange ? (
              <div className="flex items-center gap-2">
                <Button type="submit" busy={isSubmitting} disabled={!dirty}>
                  Save sign-off setting
                </Button>
                {saved ? (
                  <p role="status" className="text-sm text-muted">
                    {saved}
                  </p>
                ) : null}
              </div>
            ) : null}
          </Form>
        )}
      </Formik>
    </Panel>
  );
}
