// @vitest-environment happy-dom
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { useState } from 'react';
import { afterEach, describe, expect, it } from 'vitest';
import { Button } from './button';
import { Dialog } from './dialog';

afterEach(cleanup);

function RemoveTeodor() {
  const [open, setOpen] = useState(false);
  return (
    <>
      <Button onClick={() => setOpen(true)}>Remove Teodor</Button>
      <Dialog
        open={open}
        onClose={() => setOpen(false)}
        title="Remove Teodor Vance?"
        description="Teodor loses access straight away."
        actions={
          <>
            <Button data-autofocus onClick={() => setOpen(false)}>
              Keep Teodor
            </Button>
            <Button variant="danger">Remove from studio</Button>
          </>
        }
      />
    </>
  );
}

// Expected behaviour from the WAI-ARIA Authoring Practices "Dialog (Modal)" pattern.
describe('confirmation dialog', () => {
  it('opens on the safe choice, names itself by its title and returns focus when Escape closes it', async () => {
    render(<RemoveTeodor />);
    const opener = screen.getByRole('button', { name: 'Remove Teodor' });
    opener.focus();
    fireEvent.click(opener);

    const dialog = await screen.findByRole('dialog', { name: 'Remove Teodor Vance?' });
    const keep = screen.getByRole('button', { name: 'Keep Teodor' });
    expect(document.activeElement).toBe(keep);

    fireEvent.keyDown(dialog, { key: 'Escape' });
    await waitFor(() => expect(screen.queryByRole('button', { name: 'Keep Teodor' })).toBeNull());
    expect(document.activeElement).toBe(opener);
  });

  it('keeps Tab inside the dialog', async () => {
    render(<RemoveTeodor />);
    fireEvent.click(screen.getByRole('button', { name: 'Remove Teodor' }));
    const dialog = await screen.findByRole('dialog');
    const remove = screen.getByRole('button', { name: 'Remove from studio' });
    remove.focus();
    fireEvent.keyDown(dialog, { key: 'Tab' });
    expect(document.activeElement).toBe(screen.getByRole('button', { name: 'Keep Teodor' }));
    fireEvent.keyDown(dialog, { key: 'Tab', shiftKey: true });
    expect(document.activeElement).toBe(remove);
  });
});
