import { useEffect, useId, useRef, useState, type KeyboardEvent, type ReactNode } from 'react';
import { classNames } from './class-names';

export type MenuItem = {
  id: string;
  label: ReactNode;
  hint?: ReactNode;
  onSelect: () => void;
  /** Set for a choice among several (e.g. the current studio); renders a radio item. */
  checked?: boolean;
  disabled?: boolean;
};

type MenuProps = {
  /** What the closed button shows. */
  trigger: ReactNode;
  /** Accessible name of the button when `trigger` is not plain text. */
  triggerLabel?: string;
  items: readonly MenuItem[];
  /** Shown above the items, outside the list (e.g. who is signed in). */
  header?: ReactNode;
  align?: 'start' | 'end';
  triggerClassName?: string;
};

// A menu button after the WAI-ARIA Authoring Practices menu-button pattern: Enter, Space or
// Arrow Down open it on the first item, Arrow Up on the last; arrows, Home and End move;
// Escape closes and returns focus to the button; Tab or a click elsewhere closes it.
export function Menu({ trigger, triggerLabel, items, header, align = 'end', triggerClassName }: MenuProps) {
  const [activeIndex, setActiveIndex] = useState<number | null>(null);
  const open = activeIndex !== null;
  const buttonId = useId();
  const menuId = useId();
  const rootRef = useRef<HTMLDivElement>(null);
  const buttonRef = useRef<HTMLButtonElement>(null);
  const itemRefs = useRef<Array<HTMLButtonElement | null>>([]);

  useEffect(() => {
    if (activeIndex !== null) itemRefs.current[activeIndex]?.focus();
  }, [activeIndex]);

  useEffect(() => {
    if (!open) return;
    const closeOnOutside = (event: PointerEvent) => {
      if (!rootRef.current?.contains(event.target as Node)) setActiveIndex(null);
    };
    document.addEventListener('pointerdown', closeOnOutside);
    return () => document.removeEventListener('pointerdown', closeOnOutside);
  }, [open]);

  const close = (returnFocus: boolean) => {
    setActiveIndex(null);
    if (returnFocus) buttonRef.current?.focus();
  };

  const choose = (item: MenuItem) => {
    if (item.disabled) return;
    close(true);
    item.onSelect();
  };

  const onButtonKeyDown = (event: KeyboardEvent<HTMLButtonElement>) => {
    if (event.key === 'ArrowDown' || event.key === 'Enter' || event.key === ' ') {
      event.preventDefault();
      setActiveIndex(0);
    } else if (event.key === 'ArrowUp') {
      event.preventDefault();
      setActiveIndex(items.length - 1);
    }
  };

  const onMenuKeyDown = (event: KeyboardEvent<HTMLUListElement>) => {
    const last = items.length - 1;
    const current = activeIndex ?? 0;
    const moves: Record<string, number> = {
      ArrowDown: current === last ? 0 : current + 1,
      ArrowUp: current === 0 ? last : current - 1,
      Home: 0,
      End: last,
    };
    if (event.key in moves) {
      event.preventDefault();
      setActiveIndex(moves[event.key]);
    } else if (event.key === 'Escape') {
      event.preventDefault();
      close(true);
    } else if (event.key === 'Tab') {
      close(false);
    }
  };

  return (
    <div ref={rootRef} className="relative">
      <button
        ref={buttonRef}
        id={buttonId}
        type="button"
        aria-haspopup="menu"
        aria-expanded={open}
        aria-controls={open ? menuId : undefined}
        aria-label={triggerLabel}
        onClick={() => (open ? close(false) : setActiveIndex(0))}
        onKeyDown={onButtonKeyDown}
        className={classNames(
          'inline-flex min-h-10 items-center gap-2 rounded-md px-2.5 text-ink hover:bg-sand/60',
          open && 'bg-sand/60',
          triggerClassName,
        )}
      >
        {trigger}
        <svg viewBox="0 0 16 16" className="size-4 text-ink-soft" aria-hidden="true" focusable="false">
          <path d="M4 6l4 4 4-4" fill="none" stroke="currentColor" strokeWidth="1.8" strokeLinecap="round" />
        </svg>
      </button>
      {open && (
        <div
          className={classNames(
            'absolute top-full z-30 mt-2 w-64 rounded-lg border border-sand bg-paper py-1.5 shadow-lifted',
            align === 'end' ? 'right-0' : 'left-0',
          )}
        >
          {header && <div className="border-b border-sand px-4 pt-2 pb-3">{header}</div>}
          <ul id={menuId} role="menu" aria-labelledby={buttonId} onKeyDown={onMenuKeyDown} className="py-1">
            {items.map((item, index) => (
              <li key={item.id} role="none">
                <button
                  ref={(element) => {
                    itemRefs.current[index] = element;
                  }}
                  type="button"
                  role={item.checked === undefined ? 'menuitem' : 'menuitemradio'}
                  aria-checked={item.checked}
                  aria-disabled={item.disabled || undefined}
                  tabIndex={-1}
                  onClick={() => choose(item)}
                  onMouseEnter={() => setActiveIndex(index)}
                  className={classNames(
                    'flex w-full items-start gap-2 px-4 py-2 text-left focus:bg-sand/70 focus:shadow-[inset_3px_0_0_var(--color-tide)] focus:outline-none',
                    item.disabled && 'cursor-not-allowed opacity-60',
                  )}
                >
                  {item.checked !== undefined && (
                    <span
                      aria-hidden="true"
                      className={classNames(
                        'mt-1.5 size-2.5 shrink-0 rounded-full border border-tide',
                        item.checked && 'bg-tide',
                      )}
                    />
                  )}
                  <span className="min-w-0">
                    <span className="block font-semibold text-ink">{item.label}</span>
                    {item.hint && <span className="block text-sm text-ink-soft">{item.hint}</span>}
                  </span>
                </button>
              </li>
            ))}
          </ul>
        </div>
      )}
    </div>
  );
}
