import { METHODS, screen as runEngine } from '@hoopline/calc';
import { presentReport } from '@hoopline/present';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Project, QueueItem, Revision } from '@hoopline/contract';
import { fakeApi, ME, renderApp } from '../../test/render';
import { SignOffDone, signOffBlockedReason } from './sign-off-panel';
import { SignOffForm } from './sign-off-form';

// A real engine report (the circular plate's own example), so the dialog's figures are presented ones.
const plate = METHODS.find((m) => m.kind === 'circular-plate')!;
const report = runEngine(plate.examples[0]!.input);
const governing = presentReport(report, 'si').governing!;

const revision = {
  id: 'r1',
  number: 2,
  status: 'submitted',
  verdict: report.verdict,
  report,
  contentHash: 'ab'.repeat(32),
  verifyCode: 'abab-abab-abab',
  author: { id: 'u-other', name: 'Oli Other' },
  signOffs: [],
} as unknown as Revision;
const component = { id: 'c1', name: 'Door', tag: 'D-2' };
const project = { id: 'p1', myRole: 'checker' } as unknown as Project;
const collapse = (text: string | null) => (text ?? '').replace(/\s+/g, ' ').trim();
/** The text the dialog gives for a term of its list ("Component" → "Door D-2"). */
const row = (dialog: HTMLElement, term: string) =>
  collapse(within(dialog).getByText(term, { selector: 'dt' }).nextElementSibling!.textContent);

function form(options: { needsPassword?: boolean; onDone?: () => void } = {}) {
  return (
    <SignOffForm
      revision={revision}
      component={component}
      needsPassword={options.needsPassword ?? false}
      blockedReason={null}
      countersignBlockedReason={null}
      onDone={options.onDone ?? vi.fn()}
    />
  );
}

describe('who may sign', () => {
  it('never the author (four-eyes), whatever their role', () => {
    const own = { ...revision, author: { id: ME.user.id, name: ME.user.name } } as Revision;
    expect(signOffBlockedReason(own, project, ME.user)).toMatch(/You authored this revision/);
  });
  it('only a checker of the project; an administrator never', () => {
    expect(signOffBlockedReason(revision, { ...project, myRole: 'designer' }, ME.user)).toMatch(
      /Only a checker/,
    );
    expect(
      signOffBlockedReason(revision, { ...project, myRole: null }, { ...ME.user, isAdmin: true }),
    ).toMatch(/never sign/);
    expect(signOffBlockedReason(revision, project, ME.user)).toBeNull();
  });
});

describe('SignOffForm', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('disables both actions and says why when signing is not allowed', async () => {
    fakeApi({});
    renderApp(
      <SignOffForm
        revision={revision}
        component={component}
        needsPassword={false}
        blockedReason="You authored this revision."
        countersignBlockedReason={null}
        onDone={vi.fn()}
      />,
    );
    const countersign = await screen.findByRole('button', { name: 'Countersign' });
    expect(countersign).toBeDisabled();
    expect(countersign).toHaveAccessibleDescription('You authored this revision.');
    expect(screen.getByRole('button', { name: 'Return to designer' })).toBeDisabled();
  });

  it('needs a comment to return a revision, before any dialog opens', async () => {
    const api = fakeApi({});
    renderApp(form());
    await userEvent.click(await screen.findByRole('button', { name: 'Return to designer' }));
    expect(await screen.findByText(/a return needs a comment/)).toBeInTheDocument();
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(api.calls).toHaveLength(0);
  });

  it('Countersign opens a dialog repeating what is signed; Cancel signs nothing', async () => {
    const api = fakeApi({});
    const onDone = vi.fn();
    renderApp(form({ onDone }));
    await userEvent.click(await screen.findByRole('button', { name: 'Countersign' }));
    const dialog = screen.getByRole('dialog', { name: 'Countersign this revision?' });
    expect(row(dialog, 'Component')).toBe('Door D-2');
    expect(row(dialog, 'Revision')).toBe('2');
    // The verdict and governing check in @hoopline/present's words and figures.
    expect(row(dialog, 'Verdict')).toContain(presentReport(report, 'si').verdict.word);
    expect(row(dialog, 'Governing')).toBe(
      `${governing.checkLabel} in load case ${governing.loadCase} at ${governing.utilisation}`,
    );
    // The whole content hash (for screen readers and on hover) and the verify code.
    expect(within(dialog).getByText(revision.contentHash)).toBeInTheDocument();
    expect(row(dialog, 'Content hash')).toContain('verify code abab-abab-abab');
    expect(within(dialog).queryByText('Comment', { selector: 'dt' })).not.toBeInTheDocument();
    expect(within(dialog).queryByLabelText(/password/i)).not.toBeInTheDocument();
    await userEvent.click(within(dialog).getByRole('button', { name: 'Cancel' }));
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(api.calls).toHaveLength(0);
    expect(onDone).not.toHaveBeenCalled();
  });

  it('confirming countersigns the content hash it showed, with the optional comment', async () => {
    const signed = { ...revision, status: 'countersigned' };
    const api = fakeApi({ 'POST /revisions/r1/countersign': { body: signed } });
    const onDone = vi.fn();
    renderApp(form({ onDone }));
    await userEvent.type(await screen.findByLabelText('Comment'), 'Trail read, step 6 checked.');
    await userEvent.click(screen.getByRole('button', { name: 'Countersign' }));
    const dialog = screen.getByRole('dialog');
    expect(row(dialog, 'Comment')).toBe('Trail read, step 6 checked.');
    await userEvent.click(within(dialog).getByRole('button', { name: 'Countersign revision' }));
    await vi.waitFor(() => expect(onDone).toHaveBeenCalledWith('countersign', signed));
    expect(api.calls).toHaveLength(1);
    expect(JSON.parse(String(api.calls[0]!.init!.body))).toEqual({
      hash: revision.contentHash,
      comment: 'Trail read, step 6 checked.',
    });
  });

  it('Return repeats the comment and returns with it', async () => {
    const api = fakeApi({
      'POST /revisions/r1/return': { body: { ...revision, status: 'returned' } },
    });
    const onDone = vi.fn();
    renderApp(form({ onDone }));
    await userEvent.type(await screen.findByLabelText('Comment'), 'Step 4: wrong edge condition.');
    await userEvent.click(screen.getByRole('button', { name: 'Return to designer' }));
    const dialog = screen.getByRole('dialog', { name: 'Return this revision to the designer?' });
    expect(row(dialog, 'Comment')).toBe('Step 4: wrong edge condition.');
    await userEvent.click(within(dialog).getByRole('button', { name: 'Return revision' }));
    await vi.waitFor(() => expect(onDone).toHaveBeenCalledWith('return', expect.anything()));
    expect(api.calls[0]!.path).toBe('/revisions/r1/return');
    expect(JSON.parse(String(api.calls[0]!.init!.body))).toEqual({
      hash: revision.contentHash,
      comment: 'Step 4: wrong edge condition.',
    });
  });

  it('where the project asks, takes the password: required, the server’s refusal on the field, then signs', async () => {
    let attempt = 0;
    const api = fakeApi({
      'POST /revisions/r1/countersign': () =>
        ++attempt === 1
          ? {
              status: 403,
              body: {
                error: {
                  code: 'wrong_password',
                  message: 'the password is wrong: nothing was signed.',
                  fields: [{ path: 'password', message: 'is wrong' }],
                },
              },
            }
          : { body: { ...revision, status: 'countersigned' } },
    });
    const onDone = vi.fn();
    renderApp(form({ needsPassword: true, onDone }));
    await userEvent.click(await screen.findByRole('button', { name: 'Countersign' }));
    const dialog = screen.getByRole('dialog');
    const password = within(dialog).getByLabelText(/Your password/);
    expect(password).toHaveAttribute('type', 'password');
    expect(password).toHaveFocus();
    // Empty: the form's own message, and nothing sent.
    await userEvent.click(within(dialog).getByRole('button', { name: 'Countersign revision' }));
    expect(await within(dialog).findByText(/Type your password/)).toBeInTheDocument();
    expect(api.calls).toHaveLength(0);
    // Wrong: the server's field error on the field; the dialog stays, nothing is done.
    await userEvent.type(password, 'not my password');
    await userEvent.click(within(dialog).getByRole('button', { name: 'Countersign revision' }));
    expect(await within(dialog).findByText('Your password is wrong')).toBeInTheDocument();
    expect(within(dialog).getByLabelText(/Your password/)).toHaveAttribute('aria-invalid', 'true');
    expect(within(dialog).getByLabelText(/Your password/)).toHaveValue('');
    expect(onDone).not.toHaveBeenCalled();
    // Right: signed, with the password in the body.
    await userEvent.type(within(dialog).getByLabelText(/Your password/), 'my password');
    await userEvent.click(within(dialog).getByRole('button', { name: 'Countersign revision' }));
    await vi.waitFor(() => expect(onDone).toHaveBeenCalledWith('countersign', expect.anything()));
    expect(JSON.parse(String(api.calls[1]!.init!.body))).toEqual({
      hash: revision.contentHash,
      password: 'my password',
    });
  });

  it('shows the server’s refusal in the dialog (the revision changed under the checker)', async () => {
    fakeApi({
      'POST /revisions/r1/countersign': {
        status: 409,
        body: {
          error: {
            code: 'hash_mismatch',
            message: 'The revision has changed since you opened it.',
          },
        },
      },
    });
    renderApp(form());
    await userEvent.click(await screen.findByRole('button', { name: 'Countersign' }));
    const dialog = screen.getByRole('dialog');
    await userEvent.click(within(dialog).getByRole('button', { name: 'Countersign revision' }));
    expect(await within(dialog).findByRole('alert')).toHaveTextContent(
      'The revision has changed since you opened it.',
    );
  });
});

describe('SignOffDone', () => {
  afterEach(() => vi.unstubAllGlobals());
  const signed = { ...revision, status: 'countersigned' } as Revision;
  const queued = (id: string, name: string, number: number) =>
    ({
      id,
      number,
      status: 'submitted',
      verdict: 'pass',
      author: { id: 'u-x', name: 'Theo Brandt' },
      project: { id: 'p1', number: 'LAM-1', name: 'Line' },
      component: { id: `c-${id}`, name, kind: 'circular-plate' },
    }) as unknown as QueueItem;
  const page = (items: QueueItem[]) => ({
    body: { items, page: 1, pageSize: 50, total: items.length },
  });

  it('says what was done and links the next revision of the queue (not the one just signed)', async () => {
    fakeApi({
      'GET /check-queue': page([queued('r1', 'Door', 2), queued('r9', 'Viewport', 1)]),
    });
    renderApp(
      <SignOffDone outcome={{ decision: 'countersign', revision: signed }} component={component} />,
    );
    const status = await screen.findByRole('status');
    expect(within(status).getByRole('heading')).toHaveTextContent(
      'Revision 2 of Door D-2 countersigned',
    );
    expect(within(status).getByRole('heading')).toHaveFocus();
    expect(within(status).getByRole('link', { name: 'Revision 2' })).toHaveAttribute(
      'href',
      '/revisions/r1',
    );
    expect(within(status).getByRole('button', { name: /^Download sheet/ })).toBeInTheDocument();
    const next = await within(status).findByRole('link', { name: 'Viewport · revision 1' });
    expect(next).toHaveAttribute('href', '/revisions/r9');
  });

  it('says the queue is empty, and names the designer after a return', async () => {
    fakeApi({ 'GET /check-queue': page([queued('r1', 'Door', 2)]) });
    renderApp(
      <SignOffDone
        outcome={{ decision: 'return', revision: { ...revision, status: 'returned' } as Revision }}
        component={component}
      />,
    );
    const status = await screen.findByRole('status');
    expect(within(status).getByRole('heading')).toHaveTextContent(
      'Revision 2 of Door D-2 returned to Oli Other',
    );
    expect(await within(status).findByText(/Your check queue is empty/)).toBeInTheDocument();
    expect(
      within(status).queryByRole('button', { name: /^Download sheet/ }),
    ).not.toBeInTheDocument();
  });
});
