// @vitest-environment happy-dom
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { Menu } from './menu';

afterEach(cleanup);

const renderMenu = (onSignOut = vi.fn()) => {
  render(
    <Menu
      trigger="Ines Okafor"
      items={[
        { id: 'home', label: 'Studio home', onSelect: vi.fn() },
        { id: 'sign-out', label: 'Sign out', onSelect: onSignOut },
      ]}
    />,
  );
  return screen.getByRole('button', { name: 'Ines Okafor' });
};

// Keys from the WAI-ARIA Authoring Practices "Menu Button" pattern.
describe('menu button', () => {
  it('opens with Arrow Down on the first item and moves with the arrow keys, wrapping around', () => {
    const button = renderMenu();
    fireEvent.keyDown(button, { key: 'ArrowDown' });
    expect(button.getAttribute('aria-expanded')).toBe('true');
    const menu = screen.getByRole('menu');
    expect(document.activeElement).toBe(screen.getByRole('menuitem', { name: 'Studio home' }));
    fireEvent.keyDown(menu, { key: 'ArrowDown' });
    expect(document.activeElement).toBe(screen.getByRole('menuitem', { name: 'Sign out' }));
    fireEvent.keyDown(menu, { key: 'ArrowDown' });
    expect(document.activeElement).toBe(screen.getByRole('menuitem', { name: 'Studio home' }));
  });

  it('closes on Escape and gives focus back to its button', () => {
    const button = renderMenu();
    fireEvent.keyDown(button, { key: 'Enter' });
    fireEvent.keyDown(screen.getByRole('menu'), { key: 'Escape' });
    expect(screen.queryByRole('menu')).toBeNull();
    expect(document.activeElement).toBe(button);
  });

  it('runs the chosen item and closes', () => {
    const onSignOut = vi.fn();
    const button = renderMenu(onSignOut);
    fireEvent.keyDown(button, { key: 'ArrowUp' });
    fireEvent.click(screen.getByRole('menuitem', { name: 'Sign out' }));
    expect(onSignOut).toHaveBeenCalledOnce();
    expect(screen.queryByRole('menu')).toBeNull();
  });
});
