import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import { Dialog } from './dialog';

function Harness() {
  const [open, setOpen] = useState(false);
  return (
    <>
      <button type="button" onClick={() => setOpen(true)}>
        Remove member
      </button>
      <Dialog
        open={open}
        title="Remove member"
        onClose={() => setOpen(false)}
        footer={
          <>
            <button type="button" onClick={() => setOpen(false)}>
              Cancel
            </button>
            <button type="button">Remove</button>
          </>
        }
      >
        <p>Remove Oli from the project?</p>
      </Dialog>
    </>
  );
}

describe('Dialog', () => {
  it('takes focus, keeps Tab inside, closes on Escape and gives focus back', async () => {
    render(<Harness />);
    const opener = screen.getByRole('button', { name: 'Remove member' });
    await userEvent.click(opener);
    const dialog = screen.getByRole('dialog', { name: 'Remove member' });
    expect(dialog).toContainElement(document.activeElement as HTMLElement);
    for (let i = 0; i < 5; i++) {
      await userEvent.tab();
      expect(dialog).toContainElement(document.activeElement as HTMLElement);
    }
    await userEvent.keyboard('{Escape}');
    expect(screen.queryByRole('dialog')).not.toBeInTheDocument();
    expect(opener).toHaveFocus();
  });

  it('puts focus on the field marked data-autofocus', async () => {
    render(
      <Dialog open title="Confirm" onClose={() => undefined}>
        <button type="button">First</button>
        <label>
          Password <input data-autofocus type="password" />
        </label>
      </Dialog>,
    );
    expect(screen.getByLabelText('Password')).toHaveFocus();
  });
});
