import { Form, Formik } from 'formik';
import { useState } from 'react';
import * as yup from 'yup';
import { ruleOf } from '../../lib/contract-rules';
import { returnBody } from '@hoopline/contract';
import { useCountersign, useReturnRevision } from '../../api/revisions';
import type { Revision, StepRemark } from '@hoopline/contract';
import { Button } from '../../components/button';
import { FormError, FormikTextAreaField } from '../../components/field';
import { serverFieldErrors } from '../../components/server-errors';
import { StepRemarksField } from './step-remarks';

type Decision = 'countersign' | 'return';

export const signOffSchema = yup.object({
  decision: yup.string().oneOf(['countersign', 'return']).required(),
  comment: yup
    .string()
    .test('contract', ruleOf(returnBody.shape.comment, 'The comment'))
    .when('decision', {
      is: 'return',
      then: (s) => s.trim().required('Say what the designer must change: a return needs a comment'),
    }),
});

/**
 * The checker's decision on a submitted revision. Both actions sign the
 * content hash the checker has read; the server refuses if it has changed.
 * `blockedReason` disables both (not a checker, own revision) and says why.
 */
export function SignOffForm({
  revision,
  blockedReason,
  countersignBlockedReason,
  onDone,
}: {
  revision: Revision;
  blockedReason: string | null;
  countersignBlockedReason: string | null;
  onDone: (decision: Decision) => void;
}) {
  const countersign = useCountersign();
  const giveBack = useReturnRevision();
  const [formError, setFormError] = useState<string | null>(null);
  return (
    <Formik
      initialValues={{
        decision: 'countersign' as Decision,
        comment: '',
        remarks: [] as StepRemark[],
      }}
      validationSchema={signOffSchema}
      validateOnChange={false}
      onSubmit={async (values, helpers) => {
        setFormError(null);
        const comment = values.comment.trim();
        try {
          if (values.decision === 'countersign') {
            await countersign.mutateAsync({
              id: revision.id,
              body: { hash: revision.contentHash, ...(comment ? { comment } : {}) },
            });
          } else {
            await giveBack.mutateAsync({
              id: revision.id,
              body: {
                hash: revision.contentHash,
                comment,
                ...(values.remarks.length ? { remarks: values.remarks } : {}),
              },
            });
          }
          onDone(values.decision);
        } catch (error) {
          const mapped = serverFieldErrors(error, ['comment']);
          helpers.setErrors(mapped.fields);
          setFormError(mapped.message);
        }
      }}
    >
      {({ isSubmitting, values, setFieldValue, submitForm }) => {
        const decide = async (decision: Decision) => {
          await setFieldValue('decision', decision, false);
          await submitForm();
        };
        return (
          <Form noValidate className="flex flex-col gap-3">
            <FormError message={formError} />
            <FormikTextAreaField
              name="comment"
              label="Comment"
              hint="Required to return; optional with a countersignature. Refer to trail steps by number."
              disabled={Boolean(blockedReason)}
            />
            <StepRemarksField
              report={revision.report as Revision['report'] | undefined}
              disabled={Boolean(blockedReason) || isSubmitting}
            />
            {blockedReason ? (
              <p
                id="sign-off-blocked"
                className="rounded border border-line bg-sunken px-2.5 py-1.5 text-sm"
              >
                {blockedReason}
              </p>
            ) : null}
            {!blockedReason && countersignBlockedReason ? (
              <p
                id="countersign-blocked"
                className="rounded border border-line bg-sunken px-2.5 py-1.5 text-sm"
              >
                {countersignBlockedReason}
              </p>
            ) : null}
            <div className="flex flex-wrap gap-2">
              <Button
                variant="primary"
                busy={isSubmitting && values.decision === 'countersign'}
                disabled={Boolean(blockedReason ?? countersignBlockedReason) || isSubmitting}
                aria-describedby={
                  blockedReason
                    ? 'sign-off-blocked'
                    : countersignBlockedReason
                      ? 'countersign-blocked'
                      : undefined
                }
                onClick={() => void decide('countersign')}
              >
                Countersign
              </Button>
              <Button
                variant="danger"
                busy={isSubmitting && values.decision === 'return'}
                disabled={Boolean(blockedReason) || isSubmitting}
                aria-describedby={blockedReason ? 'sign-off-blocked' : undefined}
                onClick={() => void decide('return')}
              >
                Return to designer
              </Button>
            </div>
            <p className="text-xs text-muted">
              Signing covers content hash <span className="font-mono">{revision.verifyCode}</span>:
              the inputs, the engine version and the results shown here.
            </p>
          </Form>
        );
      }}
    </Formik>
  );
}
