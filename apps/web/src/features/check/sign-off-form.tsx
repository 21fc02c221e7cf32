import { Form, Formik, useFormikContext } from 'formik';
import { useState } from 'react';
import * as yup from 'yup';
import { ruleOf } from '../../lib/contract-rules';
import { countersignBody, returnBody } from '@hoopline/contract';
import { useCountersign, useReturnRevision } from '../../api/revisions';
import type { Component, Revision, StepRemark } from '@hoopline/contract';
import { Button } from '../../components/button';
import { Dialog } from '../../components/dialog';
import { FormError, FormikTextAreaField, FormikTextField } from '../../components/field';
import { HashText } from '../../components/hash-text';
import { VerdictBadge } from '../../components/badges';
import { serverFieldErrors } from '../../components/server-errors';
import { useUnitSystem } from '../../lib/unit-system';
import { usePresented } from '../results/report-view';
import { StepRemarksField } from './step-remarks';

export type Decision = 'countersign' | 'return';

interface SignOffValues {
  decision: Decision;
  comment: string;
  /** Remarks on trail steps, sent with a return (issue 16.1). */
  remarks: StepRemark[];
  password: string;
}

/** What the checker signs: the two decisions' validation, the password only where the project asks. */
export function signOffSchema(needsPassword: boolean) {
  return yup.object({
    decision: yup.string().oneOf(['countersign', 'return']).required(),
    comment: yup
      .string()
      .test('contract', ruleOf(returnBody.shape.comment, 'The comment'))
      .when('decision', {
        is: 'return',
        then: (s) =>
          s.trim().required('Say what the designer must change: a return needs a comment'),
      }),
    password: needsPassword
      ? yup
          .string()
          .required('Type your password: this project asks for it to sign off')
          .test('contract', ruleOf(countersignBody.shape.password, 'The password'))
      : yup.string(),
  });
}

/**
 * The checker's decision on a submitted revision. Countersign and Return each
 * open a dialog that repeats what is being signed (component, revision,
 * verdict, governing check, content hash, the comment) and, where the project
 * asks for it, takes the password again; only its confirm button signs. Both
 * actions sign the content hash the checker has read; the server refuses if
 * it has changed. `blockedReason` disables both (not a checker, own revision)
 * and says why.
 */
export function SignOffForm({
  revision,
  component,
  needsPassword,
  blockedReason,
  countersignBlockedReason,
  onDone,
}: {
  revision: Revision;
  component: Pick<Component, 'name' | 'tag'>;
  /** The project asks for the checker's password again (its sign-off setting). */
  needsPassword: boolean;
  blockedReason: string | null;
  countersignBlockedReason: string | null;
  onDone: (decision: Decision, revision: Revision) => void;
}) {
  const countersign = useCountersign();
  const giveBack = useReturnRevision();
  const [formError, setFormError] = useState<string | null>(null);
  const [confirming, setConfirming] = useState<Decision | null>(null);
  return (
    <Formik<SignOffValues>
      initialValues={{ decision: 'countersign', comment: '', remarks: [], password: '' }}
      validationSchema={signOffSchema(needsPassword)}
      validateOnChange={false}
      validateOnBlur={false}
      onSubmit={async (values, helpers) => {
        setFormError(null);
        const comment = values.comment.trim();
        const password = needsPassword ? { password: values.password } : {};
        try {
          const answer =
            values.decision === 'countersign'
              ? await countersign.mutateAsync({
                  id: revision.id,
                  body: {
                    hash: revision.contentHash,
                    ...(comment ? { comment } : {}),
                    ...password,
                  },
                })
              : await giveBack.mutateAsync({
                  id: revision.id,
                  body: {
                    hash: revision.contentHash,
                    comment,
                    ...(values.remarks.length ? { remarks: values.remarks } : {}),
                    ...password,
                  },
                });
          setConfirming(null);
          onDone(values.decision, answer);
        } catch (error) {
          const mapped = serverFieldErrors(error, ['comment', 'password']);
          const wrong = mapped.fields.password;
          // "is wrong", "is required: …" read after the field's name.
          helpers.setErrors(
            wrong ? { ...mapped.fields, password: `Your password ${wrong}` } : mapped.fields,
          );
          if (wrong) await helpers.setFieldValue('password', '', false);
          setFormError(mapped.message);
        }
      }}
    >
      {({ isSubmitting, values, setFieldValue, setFieldTouched, validateForm }) => {
        const open = async (decision: Decision) => {
          setFormError(null);
          await setFieldValue('decision', decision, false);
          const errors = await validateForm({ ...values, decision });
          if (errors.comment) {
            await setFieldTouched('comment', true, false);
            return;
          }
          await setFieldValue('password', '', false);
          await setFieldTouched('password', false, false);
          setConfirming(decision);
        };
        return (
          <Form noValidate className="flex flex-col gap-3">
            {confirming ? null : <FormError message={formError} />}
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
                disabled={Boolean(blockedReason ?? countersignBlockedReason) || isSubmitting}
                aria-describedby={
                  blockedReason
                    ? 'sign-off-blocked'
                    : countersignBlockedReason
                      ? 'countersign-blocked'
                      : undefined
                }
                aria-haspopup="dialog"
                onClick={() => void open('countersign')}
              >
                Countersign
              </Button>
              <Button
                variant="danger"
                disabled={Boolean(blockedReason) || isSubmitting}
                aria-describedby={blockedReason ? 'sign-off-blocked' : undefined}
                aria-haspopup="dialog"
                onClick={() => void open('return')}
              >
                Return to designer
              </Button>
            </div>
            <p className="text-xs text-muted">
              Signing covers content hash <span className="font-mono">{revision.verifyCode}</span>:
              the inputs, the engine version and the results shown here.
              {needsPassword ? ' This project asks for your password again to sign off.' : ''}
            </p>
            <SignOffDialog
              decision={confirming}
              revision={revision}
              component={component}
              needsPassword={needsPassword}
              formError={formError}
              onClose={() => {
                if (!isSubmitting) setConfirming(null);
              }}
            />
          </Form>
        );
      }}
    </Formik>
  );
}

const WORDS: Record<Decision, { title: string; confirm: string; lead: string }> = {
  countersign: {
    title: 'Countersign this revision?',
    confirm: 'Countersign revision',
    lead: 'You countersign exactly this revision: its inputs, engine version and results, identified by the content hash below.',
  },
  return: {
    title: 'Return this revision to the designer?',
    confirm: 'Return revision',
    lead: 'You return exactly this revision, identified by the content hash below, with your comment.',
  },
};

/** The confirmation: what is signed, repeated; the password where asked; the one button that signs. */
function SignOffDialog({
  decision,
  revision,
  component,
  needsPassword,
  formError,
  onClose,
}: {
  decision: Decision | null;
  revision: Revision;
  component: Pick<Component, 'name' | 'tag'>;
  needsPassword: boolean;
  formError: string | null;
  onClose: () => void;
}) {
  const { isSubmitting, values } = useFormikContext<SignOffValues>();
  const shown = usePresented(revision.report, useUnitSystem());
  const g = shown.governing;
  const words = decision ? WORDS[decision] : WORDS.countersign;
  const comment = values.comment.trim();
  return (
    <Dialog
      open={decision !== null}
      title={words.title}
      onClose={onClose}
      footer={
        <>
          <Button onClick={onClose} disabled={isSubmitting}>
            Cancel
          </Button>
          <Button
            type="submit"
            variant={decision === 'return' ? 'danger' : 'primary'}
            busy={isSubmitting}
          >
            {words.confirm}
          </Button>
        </>
      }
    >
      <div className="flex flex-col gap-3 text-sm">
        <FormError message={formError} />
        <p>{words.lead}</p>
        <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1.5">
          <dt className="text-muted">Component</dt>
          <dd className="font-medium">
            {component.name}
            {component.tag ? <span className="font-mono text-muted"> {component.tag}</span> : null}
          </dd>
          <dt className="text-muted">Revision</dt>
          <dd className="num">{revision.number}</dd>
          <dt className="text-muted">Verdict</dt>
          <dd>
            <VerdictBadge verdict={revision.verdict} />
          </dd>
          <dt className="text-muted">Governing</dt>
          <dd>
            {g ? (
              <>
                {g.checkLabel} in load case {g.loadCase} at{' '}
                <span className="num font-medium">{g.utilisation}</span>
              </>
            ) : (
              'no pass/fail checks'
            )}
          </dd>
          <dt className="text-muted">Content hash</dt>
          <dd className="flex flex-col gap-0.5">
            <HashText hash={revision.contentHash} label={`revision ${revision.number}`} />
            <span className="text-xs text-muted">
              verify code <span className="font-mono">{revision.verifyCode}</span>
            </span>
          </dd>
          {comment || decision === 'return' ? (
            <>
              <dt className="text-muted">Comment</dt>
              <dd className="whitespace-pre-wrap">{comment || '–'}</dd>
            </>
          ) : null}
          {decision === 'return' && values.remarks.length > 0 ? (
            <>
              <dt className="text-muted">Step remarks</dt>
              <dd>
                <ul className="list-disc pl-4">
                  {values.remarks.map((r, i) => (
                    <li key={`${r.step}-${i}`}>
                      Step <span className="num">{r.step}</span>: {r.text}
                    </li>
                  ))}
                </ul>
              </dd>
            </>
          ) : null}
        </dl>
        {needsPassword ? (
          <FormikTextField
            name="password"
            type="password"
            label="Your password"
            hint="This project asks for the password you sign in with, again, to sign off."
            autoComplete="current-password"
            required
            data-autofocus
          />
        ) : null}
      </div>
    </Dialog>
  );
}
