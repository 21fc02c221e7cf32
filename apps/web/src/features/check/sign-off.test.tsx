import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Project, Revision } from '@hoopline/contract';
import { fakeApi, ME, renderApp } from '../../test/render';
import { signOffBlockedReason } from './sign-off-panel';
import { SignOffForm } from './sign-off-form';

const revision = {
  id: 'r1',
  number: 2,
  status: 'submitted',
  verdict: 'pass',
  contentHash: 'ab'.repeat(32),
  verifyCode: 'abab-abab-abab',
  author: { id: 'u-other', name: 'Oli Other' },
  signOffs: [],
} as unknown as Revision;
const project = { id: 'p1', myRole: 'checker' } as unknown as Project;

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

  it('needs a comment to return a revision', async () => {
    const api = fakeApi({});
    renderApp(
      <SignOffForm
        revision={revision}
        blockedReason={null}
        countersignBlockedReason={null}
        onDone={vi.fn()}
      />,
    );
    await userEvent.click(await screen.findByRole('button', { name: 'Return to designer' }));
    expect(await screen.findByText(/a return needs a comment/)).toBeInTheDocument();
    expect(api.calls).toHaveLength(0);
  });

  it('countersigns the content hash it showed, with the optional comment', async () => {
    const api = fakeApi({
      'POST /revisions/r1/countersign': { body: { ...revision, status: 'countersigned' } },
    });
    const onDone = vi.fn();
    renderApp(
      <SignOffForm
        revision={revision}
        blockedReason={null}
        countersignBlockedReason={null}
        onDone={onDone}
      />,
    );
    await userEvent.type(await screen.findByLabelText('Comment'), 'Trail read, step 6 checked.');
    await userEvent.click(screen.getByRole('button', { name: 'Countersign' }));
    await vi.waitFor(() => expect(onDone).toHaveBeenCalledWith('countersign'));
    expect(JSON.parse(String(api.calls[0]!.init!.body))).toEqual({
      hash: revision.contentHash,
      comment: 'Trail read, step 6 checked.',
    });
  });

  it('shows the server’s refusal (the revision changed under the checker)', async () => {
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
    renderApp(
      <SignOffForm
        revision={revision}
        blockedReason={null}
        countersignBlockedReason={null}
        onDone={vi.fn()}
      />,
    );
    await userEvent.click(await screen.findByRole('button', { name: 'Countersign' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'The revision has changed since you opened it.',
    );
  });
});
