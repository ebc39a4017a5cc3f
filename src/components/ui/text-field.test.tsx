// @vitest-environment happy-dom
import { cleanup, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { TextField } from './text-field';

afterEach(cleanup);

// The wiring checked here follows WAI-ARIA 1.2: aria-invalid marks the control, and
// aria-describedby points at the ids of the elements whose text describes it.
describe('TextField', () => {
  it('names the input by its label', () => {
    render(<TextField label="Studio name" name="studioName" />);
    expect(screen.getByRole('textbox', { name: 'Studio name' })).toBeTruthy();
  });

  it('shows its error, marks the input invalid and links the error to it', () => {
    render(<TextField label="E-mail address" name="email" error="Enter a valid e-mail address" />);
    const input = screen.getByRole('textbox', { name: 'E-mail address' });
    const error = screen.getByText('Enter a valid e-mail address');
    expect(input.getAttribute('aria-invalid')).toBe('true');
    const describedBy = input.getAttribute('aria-describedby')?.split(' ') ?? [];
    expect(describedBy).toContain(error.closest('p')?.id);
  });

  it('links the hint before the error, and drops aria-invalid once the error is gone', () => {
    const { rerender } = render(<TextField label="Password" name="password" hint="At least 10 characters." error="Use at least 10 characters" />);
    const input = screen.getByLabelText('Password');
    const [hintId, errorId] = input.getAttribute('aria-describedby')?.split(' ') ?? [];
    expect(document.getElementById(hintId)?.textContent).toBe('At least 10 characters.');
    expect(document.getElementById(errorId)?.textContent).toBe('Use at least 10 characters');

    rerender(<TextField label="Password" name="password" hint="At least 10 characters." />);
    expect(input.hasAttribute('aria-invalid')).toBe(false);
    expect(input.getAttribute('aria-describedby')).toBe(hintId);
  });
});
