import { useId, type ButtonHTMLAttributes } from 'react';

type Variant = 'primary' | 'secondary' | 'ghost' | 'danger';

const VARIANTS: Record<Variant, string> = {
  primary: 'bg-copper-600 text-white hover:bg-copper-700 disabled:bg-copper-100 disabled:text-copper-700',
  secondary: 'bg-panel text-ink border border-line hover:border-copper-500 disabled:opacity-50',
  ghost: 'text-ink-soft hover:text-ink hover:bg-copper-50',
  danger: 'bg-state-returned text-white hover:brightness-110 disabled:opacity-50',
};

type ButtonProps = ButtonHTMLAttributes<HTMLButtonElement> & {
  variant?: Variant;
  /**
   * What a disabled button waits for, in words ("Write why in the comment: 4 of 15 characters"): shown
   * beside it and tied to it as its description, so a screen reader says it too. `quiet` keeps it for
   * assistive technology only, where the reason is plain on the page (a Save with nothing changed).
   */
  waitsFor?: string | null;
  quiet?: boolean;
};

export function Button({ variant = 'primary', className = '', waitsFor, quiet = false, ...props }: ButtonProps) {
  const id = useId();
  const reason = props.disabled && waitsFor ? waitsFor : null;
  const button = (
    <button
      type="button"
      {...props}
      aria-describedby={reason ? [props['aria-describedby'], id].filter(Boolean).join(' ') : props['aria-describedby']}
      className={`inline-flex items-center gap-1.5 whitespace-nowrap rounded px-3 py-1.5 text-sm font-semibold transition-colors disabled:cursor-not-allowed ${VARIANTS[variant]} ${className}`}
    />
  );
  if (!reason) return button;
  return (
    <span className="inline-flex flex-wrap items-center gap-x-2 gap-y-1">
      {button}
      <span id={id} role="note" className={quiet ? 'sr-only' : 'text-xs text-ink-soft'} data-testid="waits-for">
        <span aria-hidden>◔ </span>
        {reason}
      </span>
    </span>
  );
}
