import type { ButtonHTMLAttributes } from 'react';

export type ButtonVariant = 'primary' | 'secondary' | 'danger' | 'quiet';
export type ButtonSize = 'sm' | 'md';

const variants: Record<ButtonVariant, string> = {
  primary: 'bg-front text-white border-front hover:bg-front-dark hover:border-front-dark',
  secondary: 'bg-surface text-ink border-line hover:border-ink-soft hover:bg-plate',
  danger: 'bg-surface text-failed border-failed hover:bg-failed hover:text-white',
  quiet: 'bg-transparent text-front border-transparent hover:bg-front-light',
};

/** 40 px (md) keeps a target comfortable for a gloved finger on a bench tablet; sm is for dense rows. */
const sizes: Record<ButtonSize, string> = {
  sm: 'min-h-8 px-2.5 text-sm',
  md: 'min-h-10 px-4 text-sm',
};

/** The class list of a button, for links that must look like one (`<Link className={buttonClass('primary')}>`). */
export function buttonClass(variant: ButtonVariant = 'secondary', size: ButtonSize = 'md'): string {
  return [
    'inline-flex items-center justify-center gap-1.5 rounded-plate border font-medium transition-colors',
    'disabled:cursor-not-allowed disabled:opacity-55',
    variants[variant],
    sizes[size],
  ].join(' ');
}

type ButtonProps = ButtonHTMLAttributes<HTMLButtonElement> & { variant?: ButtonVariant; size?: ButtonSize };

/** A button in Rfolio's identity; `type="button"` unless told otherwise, so it never submits a form by accident. */
export function Button({ variant = 'secondary', size = 'md', className = '', type = 'button', ...rest }: ButtonProps) {
  return <button type={type} className={`${buttonClass(variant, size)} ${className}`} {...rest} />;
}
