import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { DropZone } from './drop-zone';

afterEach(cleanup);

const drop = (files: File[]) =>
  fireEvent.drop(screen.getByTestId('drop-zone'), { dataTransfer: { files, types: ['Files'] } });

describe('drop zone for originals', () => {
  it('refuses a file of the wrong type with a message, and hands nothing on', () => {
    const onFile = vi.fn();
    render(<DropZone onFile={onFile} limitBytes={1024 ** 3} />);
    drop([new File(['hello'], 'shopping-list.txt', { type: 'text/plain' })]);
    expect(screen.getByRole('alert').textContent).toContain('shopping-list.txt');
    expect(screen.getByRole('alert').textContent).toContain('PSD');
    expect(onFile).not.toHaveBeenCalled();
  });

  it('refuses a file over the size limit', () => {
    const onFile = vi.fn();
    render(<DropZone onFile={onFile} limitBytes={4} />);
    drop([new File(['12345'], 'kite.png', { type: 'image/png' })]);
    expect(screen.getByRole('alert').textContent).toMatch(/larger than the upload limit/);
    expect(onFile).not.toHaveBeenCalled();
  });

  it('hands on a dropped PSD', () => {
    const onFile = vi.fn();
    render(<DropZone onFile={onFile} />);
    const psd = new File(['8BPS'], 'puffin-picnic.psd');
    drop([psd]);
    expect(onFile).toHaveBeenCalledWith(psd);
    expect(screen.queryByRole('alert')).toBeNull();
  });

  it('offers a keyboard-reachable button that opens the file chooser', () => {
    render(<DropZone onFile={vi.fn()} />);
    const input = document.querySelector<HTMLInputElement>('input[type=file]');
    const opened = vi.fn();
    input?.addEventListener('click', opened);
    const button = screen.getByRole('button', { name: 'Choose a file…' });
    button.focus();
    expect(document.activeElement).toBe(button);
    fireEvent.click(button);
    expect(opened).toHaveBeenCalledOnce();
  });

  it('checks a file chosen with the button the same way as a dropped one', () => {
    const onFile = vi.fn();
    render(<DropZone onFile={onFile} />);
    const input = document.querySelector<HTMLInputElement>('input[type=file]') as HTMLInputElement;
    fireEvent.change(input, { target: { files: [new File(['x'], 'poster.indd')] } });
    expect(screen.getByRole('alert').textContent).toMatch(/\.indd file/);
    expect(onFile).not.toHaveBeenCalled();
  });
});
