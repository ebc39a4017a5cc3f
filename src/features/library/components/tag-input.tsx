import { useId, useMemo, useState, type KeyboardEvent } from 'react';
import { tagSchema } from '@shared/contracts/motifs';
import { classNames } from '../../../components/ui/class-names';
import { controlClasses } from '../../../components/ui/field-parts';

export type TagSuggestion = { tag: string; count?: number };

type TagInputProps = {
  label: string;
  tags: readonly string[];
  onChange: (tags: string[]) => void;
  suggestions: readonly TagSuggestion[];
  hint?: string;
  /** Filters choose among existing tags; editing may add new ones. */
  allowNew?: boolean;
  disabled?: boolean;
  placeholder?: string;
  /** When a heading right above already says what the tags are. */
  hideLabel?: boolean;
};

const MAX_SUGGESTIONS = 8;

// Tags whose words start with what was typed come first, then tags containing it anywhere.
export function suggestTags(typed: string, suggestions: readonly TagSuggestion[], chosen: readonly string[]): TagSuggestion[] {
  const text = typed.trim().toLowerCase();
  const open = suggestions.filter((s) => !chosen.includes(s.tag));
  if (!text) return open.slice(0, MAX_SUGGESTIONS);
  const starts = open.filter((s) => s.tag.split(' ').some((word) => word.startsWith(text)));
  const contains = open.filter((s) => !starts.includes(s) && s.tag.includes(text));
  return [...starts, ...contains].slice(0, MAX_SUGGESTIONS);
}

// A combobox after the WAI-ARIA "Combobox with listbox popup" pattern: arrows move through the
// suggestions, Enter or comma adds, Backspace on an empty box removes the last tag.
export function TagInput({ label, tags, onChange, suggestions, hint, allowNew = true, disabled, placeholder, hideLabel }: TagInputProps) {
  const id = useId();
  const [typed, setTyped] = useState('');
  const [open, setOpen] = useState(false);
  const [active, setActive] = useState(-1);
  const [problem, setProblem] = useState<string | null>(null);
  const options = useMemo(() => suggestTags(typed, suggestions, tags), [typed, suggestions, tags]);
  const listId = `${id}-list`;
  const showList = open && options.length > 0;

  const add = (raw: string) => {
    const parsed = tagSchema.safeParse(raw);
    if (!parsed.success) {
      if (raw.trim()) setProblem(parsed.error.issues[0]?.message ?? 'That is not a tag');
      return;
    }
    const known = suggestions.some((s) => s.tag === parsed.data);
    if (!allowNew && !known) {
      setProblem(`No motif is tagged “${parsed.data}”.`);
      return;
    }
    setProblem(null);
    if (!tags.includes(parsed.data)) onChange([...tags, parsed.data]);
    setTyped('');
    setActive(-1);
    setOpen(false);
  };

  // The list sits in the page's flow, so closing it moves what is below. Closing on blur would
  // move a button between its press and its release and lose the click: close after the click
  // (or the key) that took focus away instead.
  const closeAfterLeaving = () => {
    const close = () => {
      setOpen(false);
      setActive(-1);
      document.removeEventListener('click', close, true);
      document.removeEventListener('keyup', close, true);
    };
    document.addEventListener('click', close, true);
    document.addEventListener('keyup', close, true);
  };

  const onKeyDown = (event: KeyboardEvent<HTMLInputElement>) => {
    if (event.key === 'ArrowDown') {
      event.preventDefault();
      setOpen(true);
      setActive((a) => (options.length === 0 ? -1 : (a + 1) % options.length));
    } else if (event.key === 'ArrowUp') {
      event.preventDefault();
      setOpen(true);
      setActive((a) => (options.length === 0 ? -1 : a <= 0 ? options.length - 1 : a - 1));
    } else if (event.key === 'Enter' || event.key === ',') {
      if (event.key === 'Enter' && !typed.trim() && active < 0) return;
      event.preventDefault();
      add(showList && active >= 0 ? options[active].tag : typed);
    } else if (event.key === 'Escape') {
      if (showList) {
        event.preventDefault();
        event.stopPropagation();
        setOpen(false);
        setActive(-1);
      }
    } else if (event.key === 'Backspace' && typed === '' && tags.length > 0) {
      onChange(tags.slice(0, -1));
    }
  };

  return (
    <div className="flex flex-col gap-1.5">
      <label htmlFor={id} className={hideLabel ? 'sr-only' : 'font-semibold text-ink'}>
        {label}
      </label>
      {hint && (
        <p id={`${id}-hint`} className="-mt-1 text-sm text-ink-soft">
          {hint}
        </p>
      )}
      {tags.length > 0 && (
        <ul className="flex flex-wrap gap-1.5" aria-label={`${label}: chosen`}>
          {tags.map((tag) => (
            <li key={tag} className="inline-flex items-center rounded-full border border-tide/40 bg-tide/10 pl-2.5 text-sm text-tide-deep">
              <span className="break-all">{tag}</span>
              <button
                type="button"
                disabled={disabled}
                onClick={() => onChange(tags.filter((t) => t !== tag))}
                className="ml-0.5 inline-flex size-7 items-center justify-center rounded-full hover:bg-tide/15"
                aria-label={`Remove tag ${tag}`}
              >
                <svg viewBox="0 0 16 16" className="size-3" aria-hidden="true" focusable="false">
                  <path d="M4 4l8 8M12 4l-8 8" stroke="currentColor" strokeWidth="1.8" strokeLinecap="round" />
                </svg>
              </button>
            </li>
          ))}
        </ul>
      )}
      <div>
        <input
          id={id}
          type="text"
          role="combobox"
          autoComplete="off"
          aria-autocomplete="list"
          aria-expanded={showList}
          aria-controls={listId}
          aria-activedescendant={showList && active >= 0 ? `${listId}-${active}` : undefined}
          aria-describedby={classNames(hint && `${id}-hint`, problem && `${id}-problem`) || undefined}
          aria-invalid={problem ? true : undefined}
          disabled={disabled}
          value={typed}
          placeholder={placeholder}
          onChange={(event) => {
            setTyped(event.target.value);
            setOpen(true);
            setActive(-1);
            setProblem(null);
          }}
          onBlur={closeAfterLeaving}
          onKeyDown={onKeyDown}
          className={classNames(controlClasses, problem ? 'border-rust' : 'border-sand')}
        />
        {showList && (
          <ul
            id={listId}
            role="listbox"
            aria-label={`${label}: suggestions`}
            // In the flow of the page, not floating: inside a dialog (which scrolls) a floating list would be cut off.
            className="mt-1 max-h-56 overflow-auto rounded-md border border-sand bg-paper py-1 shadow-paper"
          >
            {options.map((option, index) => (
              <li
                key={option.tag}
                id={`${listId}-${index}`}
                role="option"
                aria-selected={index === active}
                // mousedown, not click: the input must not lose focus (and close the list) first
                onMouseDown={(event) => {
                  event.preventDefault();
                  add(option.tag);
                }}
                className={classNames(
                  'flex cursor-pointer justify-between gap-3 px-3 py-1.5',
                  index === active ? 'bg-sand/70 shadow-[inset_3px_0_0_var(--color-tide)]' : 'hover:bg-sand/40',
                )}
              >
                <span className="break-all text-ink">{option.tag}</span>
                {option.count !== undefined && <span className="text-sm text-ink-soft tabular-nums">{option.count}</span>}
              </li>
            ))}
          </ul>
        )}
      </div>
      {problem && (
        <p id={`${id}-problem`} className="text-sm font-semibold text-rust">
          {problem}
        </p>
      )}
    </div>
  );
}
