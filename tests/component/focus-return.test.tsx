/**
 * The focus-return hook the site forms use: a button opens an inline form and hides, and when the form closes the
 * focus lands on the button again, with what the form closed with kept for the status line.
 */
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { useFocusReturn } from '@/lib/use-focus-return';

function InlineForm() {
  const { open, setOpen, close, opener, closedWith } = useFocusReturn<string | null>();
  return (
    <div>
      <button type="button">Before</button>
      {!open && (
        <button ref={opener} type="button" onClick={() => setOpen(true)}>
          Add room
        </button>
      )}
      <p role="status">{closedWith ? `Room “${closedWith}” added.` : ''}</p>
      {open && (
        <form>
          <input name="name" aria-label="Name" autoFocus />
          <button type="button" onClick={() => close('Hall B (synthetic)')}>
            Save
          </button>
          <button type="button" onClick={() => close(null)}>
            Cancel
          </button>
        </form>
      )}
    </div>
  );
}

describe('useFocusReturn', () => {
  it('leaves the focus alone on the first render', () => {
    render(<InlineForm />);
    expect(document.activeElement).toBe(document.body);
    expect(screen.getByRole('status').textContent).toBe('');
  });

  it('returns the focus to the opening button after a save and keeps what was saved', async () => {
    const user = userEvent.setup();
    render(<InlineForm />);
    await user.click(screen.getByRole('button', { name: 'Add room' }));
    expect(screen.queryByRole('button', { name: 'Add room' })).toBeNull();
    await user.click(screen.getByRole('button', { name: 'Save' }));
    expect(document.activeElement).toBe(screen.getByRole('button', { name: 'Add room' }));
    expect(screen.getByRole('status').textContent).toBe('Room “Hall B (synthetic)” added.');
  });

  it('returns the focus after a cancel too, and again on a second close with the same outcome', async () => {
    const user = userEvent.setup();
    render(<InlineForm />);
    for (let round = 0; round < 2; round++) {
      await user.click(screen.getByRole('button', { name: 'Add room' }));
      await user.click(screen.getByRole('button', { name: 'Cancel' }));
      expect(document.activeElement).toBe(screen.getByRole('button', { name: 'Add room' }));
      // Move the focus away, so the second round shows the hook moving it back.
      screen.getByRole('button', { name: 'Before' }).focus();
    }
    expect(screen.getByRole('status').textContent).toBe('');
  });
});
