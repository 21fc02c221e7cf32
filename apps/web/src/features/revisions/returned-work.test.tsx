import { METHODS, screen as runEngine } from '@hoopline/calc';
import type { ReturnedItem, Revision } from '@hoopline/contract';
import { numberedSteps } from '@hoopline/present';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { fakeApi, renderApp } from '../../test/render';
import { ReturnedRoute } from '../../routes/returned';
import { SignOffForm } from '../check/sign-off-form';
import { TrailTable, useTrailHighlight } from '../results/trail-table';
import { ReturnedNotice } from './returned-notice';

const example = METHODS.find((m) => m.kind === 'circular-plate')!.examples[0]!;
const report = runEngine(example.input);
const steps = numberedSteps(report);

const revision = {
  id: 'r1',
  number: 2,
  status: 'submitted',
  verdict: report.verdict,
  contentHash: 'ab'.repeat(32),
  verifyCode: 'abab-abab-abab',
  author: { id: 'u-other', name: 'Oli Other' },
  componentId: 'c1',
  projectId: 'p1',
  report,
  inputs: example.input,
  signOffs: [],
} as unknown as Revision;

const returned: Revision = {
  ...revision,
  status: 'returned',
  signOffs: [
    {
      id: 's1',
      checker: { id: 'u-check', name: 'Chris Checker' },
      decision: 'returned',
      comment: 'Look at steps 2 and 3, and step 999.',
      hashSigned: revision.contentHash,
      createdAt: '2026-12-03T09:15:00Z',
      remarks: [{ step: steps.length, text: 'Say which basis this is.' }],
    },
  ],
};

/** The workbench's arrangement: the notice above, the trail below, the trail marked by the link followed. */
function NoticeAndTrail() {
  const highlight = useTrailHighlight();
  return (
    <>
      <ReturnedNotice revision={returned} />
      <TrailTable report={returned.report} system="si" highlight={highlight} />
    </>
  );
}

describe('returned work (issue 16.1)', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('the checker adds a remark against a step; the return sends it with the comment', async () => {
    const api = fakeApi({
      'POST /revisions/r1/return': { body: { ...revision, status: 'returned' } },
    });
    const onDone = vi.fn();
    renderApp(
      <SignOffForm
        revision={revision}
        component={{ name: 'Door', tag: 'D-1' }}
        needsPassword={false}
        blockedReason={null}
        countersignBlockedReason={null}
        onDone={onDone}
      />,
    );
    await userEvent.type(await screen.findByLabelText('Comment'), 'See step 2.');
    // Adding without a step says what is missing and adds nothing.
    await userEvent.click(screen.getByRole('button', { name: 'Add remark' }));
    expect(await screen.findByText('Pick the step the remark is about.')).toBeInTheDocument();
    await userEvent.selectOptions(screen.getByLabelText('Step'), String(steps[1]!.number));
    await userEvent.type(screen.getByLabelText('Remark'), 'Where does this value come from?');
    await userEvent.click(screen.getByRole('button', { name: 'Add remark' }));
    const list = screen.getByRole('list', { name: 'Remarks to send' });
    expect(within(list).getByText(/Where does this value come from\?/)).toBeInTheDocument();
    expect(list).toHaveTextContent(`Step 2 · ${steps[1]!.step.label}`);

    await userEvent.click(screen.getByRole('button', { name: 'Return to designer' }));
    // The confirmation dialog repeats the remark before anything is sent.
    const dialog = await screen.findByRole('dialog');
    expect(dialog).toHaveTextContent('Step 2: Where does this value come from?');
    expect(api.calls).toHaveLength(0);
    await userEvent.click(within(dialog).getByRole('button', { name: 'Return revision' }));
    await vi.waitFor(() => expect(onDone).toHaveBeenCalledWith('return', expect.anything()));
    expect(JSON.parse(String(api.calls[0]!.init!.body))).toEqual({
      hash: revision.contentHash,
      comment: 'See step 2.',
      remarks: [{ step: 2, text: 'Where does this value come from?' }],
    });
  });

  it('the notice says who returned it and when, links the comment’s steps and the remarks to the trail', async () => {
    fakeApi({});
    renderApp(<NoticeAndTrail />, { path: '/components/c1' });
    const notice = await screen.findByRole('region', { name: 'Revision 2 was returned to you' });
    expect(notice).toHaveTextContent('Returned by Chris Checker');
    expect(within(notice).getByText(/2026-12-03/).tagName).toBe('TIME');
    // "steps 2 and 3": each number a link; step 999 is not in this trail, so plain text.
    expect(within(notice).getByRole('link', { name: '2' })).toHaveAttribute(
      'href',
      '/components/c1#trail-step-2',
    );
    expect(within(notice).getByRole('link', { name: '3' })).toBeInTheDocument();
    expect(within(notice).queryByRole('link', { name: /999/ })).toBeNull();

    const last = steps.length;
    const remark = within(notice).getByRole('link', { name: new RegExp(`^Step ${last} · `) });
    const row = document.getElementById(`trail-step-${last}`)!;
    expect(row).not.toHaveAttribute('aria-current');
    await userEvent.click(remark);
    await vi.waitFor(() => expect(row).toHaveAttribute('aria-current', 'location'));
    expect(row).toHaveFocus();
    expect(notice).toHaveTextContent('Say which basis this is.');
  });

  it('once the designer has changed inputs, the step links open the returned revision’s own page', async () => {
    fakeApi({});
    renderApp(<ReturnedNotice revision={returned} edited />, { path: '/components/c1' });
    const notice = await screen.findByRole('region', { name: 'Revision 2 was returned to you' });
    // The trail on the workbench is the live one now, numbered afresh: not the one the steps name.
    // In a new tab: the workbench's unsaved inputs stay where they are.
    const inComment = within(notice).getByRole('link', { name: /^2\s*\(opens in a new tab\)$/ });
    expect(inComment).toHaveAttribute('href', `/revisions/${returned.id}#trail-step-2`);
    expect(inComment).toHaveAttribute('target', '_blank');
    const remark = within(notice).getByRole('link', {
      name: new RegExp(`^Step ${steps.length} · .*\\s*\\(opens in a new tab\\)$`),
    });
    expect(remark).toHaveAttribute('href', `/revisions/${returned.id}#trail-step-${steps.length}`);
    expect(remark).toHaveAttribute('target', '_blank');
    expect(notice).toHaveTextContent('You have changed inputs');
  });

  it('lists what was returned to me, each linking to its workbench', async () => {
    const item: ReturnedItem = {
      project: { id: 'p1', number: 'HL-1', name: 'Drying line' },
      component: { id: 'c1', name: 'Door plate', kind: 'circular-plate' },
      revision: {
        id: 'r1',
        number: 2,
        status: 'returned',
        verdict: 'pass',
        contentHash: 'ab'.repeat(32),
        author: { id: 'u-designer', name: 'Dana Designer' },
        createdAt: '2026-12-02T08:00:00Z',
        submittedAt: '2026-12-02T09:00:00Z',
        decidedAt: '2026-12-03T09:15:00Z',
        superseded: false,
      },
      returnedBy: { id: 'u-check', name: 'Chris Checker' },
      returnedAt: '2026-12-03T09:15:00Z',
      commentExcerpt: 'Look at step 2…',
      remarkCount: 3,
    };
    fakeApi({ 'GET /returned': { body: { items: [item], page: 1, pageSize: 50, total: 1 } } });
    renderApp(<ReturnedRoute />, { path: '/returned' });
    const link = await screen.findByRole('link', { name: 'Door plate · revision 2' });
    expect(link).toHaveAttribute('href', '/components/c1');
    const row = link.closest('tr')!;
    expect(row).toHaveTextContent('Chris Checker');
    expect(row).toHaveTextContent('Look at step 2…');
    expect(row).toHaveTextContent('3');
    expect(screen.getByRole('complementary', { name: 'Screening caution' })).toBeInTheDocument();
  });
});
