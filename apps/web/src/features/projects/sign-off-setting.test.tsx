import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { MemberList, Project } from '@hoopline/contract';
import { fakeApi, renderApp } from '../../test/render';
import { SignOffSetting } from './sign-off-setting';

const project = { id: 'p1', version: 4, signOffPassword: false } as unknown as Project;
const members = (canManage: boolean): MemberList => ({
  items: [],
  canManage,
  managers: [{ id: 'u-o', name: 'Dana Okafor', owner: true }],
  hasChecker: true,
});
const LABEL = 'Checkers type their password again to countersign or return';

describe('SignOffSetting', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('the owner turns it on through the project update', async () => {
    const api = fakeApi({
      'PATCH /projects/p1': { body: { ...project, signOffPassword: true, version: 5 } },
    });
    renderApp(<SignOffSetting project={project} members={members(true)} />);
    const box = screen.getByRole('checkbox', { name: LABEL });
    expect(box).not.toBeChecked();
    await userEvent.click(box);
    await userEvent.click(screen.getByRole('button', { name: 'Save sign-off setting' }));
    expect(await screen.findByRole('status')).toHaveTextContent(/now asks for the password/);
    expect(JSON.parse(String(api.calls[0]!.init!.body))).toEqual({
      signOffPassword: true,
      version: 4,
    });
  });

  it('others see it, cannot change it, and are told who can', () => {
    fakeApi({});
    renderApp(
      <SignOffSetting project={{ ...project, signOffPassword: true }} members={members(false)} />,
    );
    const box = screen.getByRole('checkbox', { name: LABEL });
    expect(box).toBeChecked();
    expect(box).toBeDisabled();
    expect(box).toHaveAccessibleDescription(
      /owner or an administrator changes this \(Dana Okafor\)/,
    );
    expect(screen.queryByRole('button', { name: 'Save sign-off setting' })).not.toBeInTheDocument();
  });
});
