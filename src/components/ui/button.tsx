import type { ButtonHTMLAttributes, MouseEvent, ReactNode } from 'react';
import { Link, type LinkProps } from 'react-router-dom';
import { classNames } from './class-names';
import { Spinner } from './spinner';

export type ButtonVariant = 'primary' | 'secondary' | 'quiet' | 'danger';
export type ButtonSize = 'md' | 'sm';

const base =
  'inline-flex items-center justify-center gap-2 rounded-md font-semibold transition-colors ' +
  'disabled:cursor-not-allowed disabled:opacity-55 aria-disabled:cursor-progress';

const variants: Record<ButtonVariant, string> = {
  primary: 'bg-tide text-paper hover:bg-tide-deep',
  secondary: 'border border-sand bg-paper text-ink hover:border-tide hover:text-tide-deep',
  quiet: 'text-tide-deep hover:bg-sand/60',
  danger: 'bg-rust text-paper hover:bg-[#953826]',
};

const sizes: Record<ButtonSize, string> = {
  md: 'min-h-10 px-4 text-base',
  sm: 'min-h-8 px-3 text-sm',
};

export function buttonClasses(variant: ButtonVariant = 'primary', size: ButtonSize = 'md', extra?: string) {
  return classNames(base, variants[variant], sizes[size], extra);
}

type ButtonProps = ButtonHTMLAttributes<HTMLButtonElement> & {
  variant?: ButtonVariant;
  size?: ButtonSize;
  /** While busy the button keeps focus (aria-disabled, not disabled) and ignores clicks. */
  busy?: boolean;
  busyLabel?: ReactNode;
};

export function Button({
  variant = 'primary',
  size = 'md',
  busy = false,
  busyLabel,
  type = 'button',
  className,
  children,
  onClick,
  ...rest
}: ButtonProps) {
  const handleClick = (event: MouseEvent<HTMLButtonElement>) => {
    if (busy) {
      event.preventDefault();
      return;
    }
    onClick?.(event);
  };
  return (
    <button
      type={type}
      className={buttonClasses(variant, size, className)}
      aria-disabled={busy || undefined}
      aria-busy={busy || undefined}
      onClick={handleClick}
      {...rest}
    >
      {busy && <Spinner className="size-4" />}
      {busy && busyLabel ? busyLabel : children}
    </button>
  );
}

type ButtonLinkProps = LinkProps & { variant?: ButtonVariant; size?: ButtonSize };

export function ButtonLink({ variant = 'primary', size = 'md', className, ...rest }: ButtonLinkProps) {
  return <Link className={buttonClasses(variant, size, typeof className === 'string' ? className : undefined)} {...rest} />;
}
