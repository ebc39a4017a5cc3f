import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { useState } from 'react';
import { afterEach, describe, expect, it } from 'vitest';
import { suggestTags, TagInput } from './tag-input';

afterEach(cleanup);

const studioTags = [{ tag: 'puffin' }, { tag: 'picnic basket' }, { tag: 'lantern' }, { tag: 'spring' }, { tag: 'kite' }];

function Tags({ allowNew = true }: { allowNew?: boolean }) {
  const [tags, setTags] = useState<string[]>(['kite']);
  return <TagInput label="Tags" tags={tags} onChange={setTags} suggestions={studioTags} allowNew={allowNew} />;
}

describe('tag input', () => {
  it('suggests tags with a word starting as typed before tags merely containing it, leaving out chosen ones', () => {
    expect(suggestTags('p', studioTags, ['puffin']).map((s) => s.tag)).toEqual(['picnic basket', 'spring']);
    expect(suggestTags('bas', studioTags, []).map((s) => s.tag)).toEqual(['picnic basket']);
  });

  it('picks a suggestion with the arrow keys and Enter, as a combobox does', () => {
    render(<Tags />);
    const box = screen.getByRole('combobox', { name: 'Tags' });
    fireEvent.change(box, { target: { value: 'lan' } });
    expect(box.getAttribute('aria-expanded')).toBe('true');
    fireEvent.keyDown(box, { key: 'ArrowDown' });
    expect(box.getAttribute('aria-activedescendant')).toBe(screen.getByRole('option', { name: 'lantern' }).id);
    fireEvent.keyDown(box, { key: 'Enter' });
    expect(screen.getByRole('button', { name: 'Remove tag lantern' })).toBeTruthy();
  });

  it('adds a new tag, written the way the studio stores tags', () => {
    render(<Tags />);
    const box = screen.getByRole('combobox', { name: 'Tags' });
    fireEvent.change(box, { target: { value: '  Coastal   SPRING ' } });
    fireEvent.keyDown(box, { key: 'Enter' });
    expect(screen.getByRole('button', { name: 'Remove tag coastal spring' })).toBeTruthy();
  });

  it('removes the last tag with Backspace in an empty box', () => {
    render(<Tags />);
    fireEvent.keyDown(screen.getByRole('combobox', { name: 'Tags' }), { key: 'Backspace' });
    expect(screen.queryByRole('button', { name: 'Remove tag kite' })).toBeNull();
  });

  it('as a filter, refuses a tag no motif carries', () => {
    render(<Tags allowNew={false} />);
    const box = screen.getByRole('combobox', { name: 'Tags' });
    fireEvent.change(box, { target: { value: 'walrus' } });
    fireEvent.keyDown(box, { key: 'Enter' });
    expect(screen.getByText('No motif is tagged “walrus”.')).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Remove tag walrus' })).toBeNull();
  });
});
