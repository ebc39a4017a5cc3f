import { useId, useState, type FormEvent, type KeyboardEvent } from 'react';
import { COMMENT_BODY_MAX } from '@shared/contracts/reviews';
import { Button } from '../../../components/ui/button';
import { borderFor, controlClasses } from '../../../components/ui/field-parts';
import { errorMessageOf } from '../../../lib/use-form-errors';

type CommentFormProps = {
  label: string;
  submitLabel: string;
  busy: boolean;
  error: unknown;
  onSubmit: (body: string) => Promise<unknown>;
  onCancel?: () => void;
  autoFocus?: boolean;
  /** Required text (a reply, a new comment) or optional (a note to a request). */
  required?: boolean;
  maxLength?: number;
  placeholder?: string;
};

// A plain-text box for comments and review notes; the typed text is kept when sending fails.
export function CommentForm({ label, submitLabel, busy, error, onSubmit, onCancel, autoFocus, required = true, maxLength = COMMENT_BODY_MAX, placeholder }: CommentFormProps) {
  const id = useId();
  const [body, setBody] = useState('');
  const [empty, setEmpty] = useState(false);
  const serverMessage = error ? errorMessageOf(error) : null;
  const message = empty ? 'Write something first' : serverMessage;

  const submit = async (event?: FormEvent) => {
    event?.preventDefault();
    if (required && !body.trim()) {
      setEmpty(true);
      return;
    }
    try {
      await onSubmit(body.trim());
      setBody('');
    } catch {
      // the mutation's error is shown below; the text stays for another try
    }
  };
  const onKeyDown = (event: KeyboardEvent<HTMLTextAreaElement>) => {
    if (event.key === 'Enter' && (event.metaKey || event.ctrlKey)) void submit();
    if (event.key === 'Escape' && onCancel) onCancel();
  };

  return (
    <form onSubmit={(e) => void submit(e)} className="flex flex-col gap-2" noValidate>
      <label htmlFor={id} className="text-sm font-semibold text-ink">{label}</label>
      <textarea
        id={id}
        value={body}
        rows={3}
        maxLength={maxLength}
        autoFocus={autoFocus}
        placeholder={placeholder}
        aria-invalid={message ? true : undefined}
        aria-describedby={message ? `${id}-error` : `${id}-hint`}
        onChange={(e) => {
          setBody(e.target.value);
          setEmpty(false);
        }}
        onKeyDown={onKeyDown}
        className={`${controlClasses} ${borderFor(message ?? undefined)}`}
      />
      {message ? (
        <p id={`${id}-error`} role="alert" className="text-sm font-semibold text-rust">{message}</p>
      ) : (
        <p id={`${id}-hint`} className="text-xs text-ink-soft">{body.length.toLocaleString()} / {maxLength.toLocaleString()} · Ctrl+Enter sends</p>
      )}
      <div className="flex gap-2">
        <Button type="submit" size="sm" busy={busy} busyLabel="Sending…">{submitLabel}</Button>
        {onCancel && <Button size="sm" variant="quiet" onClick={onCancel}>Cancel</Button>}
      </div>
    </form>
  );
}
