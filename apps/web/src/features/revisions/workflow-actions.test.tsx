import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Project, RevisionSummary } from '@hoopline/contract';
import { fakeApi, ME, renderApp } from '../../test/render';
import { WorkflowActions } from './workflow-actions';

const project = { id: 'p1', number: 'HL-1', myRole: 'designer' } as Project;
const draft: RevisionSummary = {
  id: 'r1',
  number: 1,
  status: 'draft',
  verdict: 'pass',
  contentHash: 'h',
  author: { id: ME.user.id, name: ME.user.name },
  createdAt: '2026-01-01T00:00:00Z',
  submittedAt: null,
  decidedAt: null,
  superseded: false,
};
const answer = (warnings?: unknown) => ({
  body: {
    ...draft,
    status: 'submitted',
    componentId: 'c1',
    projectId: 'p1',
    ...(warnings ? { warnings } : {}),
  },
});

describe('Submit: the no-checker warning (issue 16.3)', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('shows the warning the answer carries, with who can add a checker and a link to Members', async () => {
    fakeApi({
      'POST /revisions/r1/submit': answer([
        {
          code: 'no_checker',
          message:
            'This project has no checker other than you, so nobody can countersign this revision yet. Dana Designer, Ada Admin can add a checker on the members page.',
          whoCanAdd: ['Dana Designer', 'Ada Admin'],
        },
      ]),
    });
    renderApp(<WorkflowActions project={project} revision={draft} />);
    expect(screen.queryByRole('status')).toBeNull();
    await userEvent.click(screen.getByRole('button', { name: 'Submit revision 1 for check' }));
    const status = await screen.findByRole('status');
    expect(status).toHaveTextContent('Submitted, but nobody can check it yet.');
    expect(status).toHaveTextContent('Dana Designer, Ada Admin can add a checker');
    expect(screen.getByRole('link', { name: 'Members' })).toHaveAttribute(
      'href',
      '/projects/p1/members',
    );
  });

  it('shows nothing when the answer has no warnings', async () => {
    const { calls } = fakeApi({ 'POST /revisions/r1/submit': answer() });
    renderApp(<WorkflowActions project={project} revision={draft} />);
    await userEvent.click(screen.getByRole('button', { name: 'Submit revision 1 for check' }));
    await vi.waitFor(() => expect(calls.some((c) => c.method === 'POST')).toBe(true));
    expect(screen.queryByRole('status')).toBeNull();
  });
});
