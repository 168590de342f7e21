import type { ButtonHTMLAttributes } from 'react';

export type ButtonVariant = 'primary' | 'secondary' | 'danger' | 'quiet';

const base =
  'inline-flex min-h-touch items-center justify-center gap-2 rounded-panel px-4 py-2 text-base font-semibold ' +
  'transition-colors disabled:cursor-not-allowed disabled:opacity-60';

const variants: Record<ButtonVariant, string> = {
  primary: 'bg-lacquer-700 text-white hover:bg-lacquer-800',
  secondary: 'border border-maple-400 bg-white text-maple-900 hover:bg-maple-100',
  danger: 'bg-verdict-stop text-white hover:brightness-90',
  quiet: 'text-lacquer-800 underline-offset-4 hover:bg-lacquer-50 hover:underline',
};

export function buttonClasses(variant: ButtonVariant = 'primary', extra = ''): string {
  return `${base} ${variants[variant]} ${extra}`.trim();
}

interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  pending?: boolean;
  pendingText?: string;
}

/** A button at least 44 px tall for gloved hands; shows its pending words while a call runs. */
export function Button({ variant = 'primary', pending = false, pendingText, className = '', children, disabled, type = 'button', ...rest }: ButtonProps) {
  return (
    <button type={type} className={buttonClasses(variant, className)} disabled={disabled || pending} aria-busy={pending || undefined} {...rest}>
      {pending && pendingText ? pendingText : children}
    </button>
  );
}
