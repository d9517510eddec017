import type { ButtonHTMLAttributes, ReactNode } from 'react';

export type ChipTone = 'neutral' | 'front' | 'spot';

const tones: Record<ChipTone, string> = {
  neutral: 'border-line bg-plate text-ink',
  front: 'border-front/30 bg-front-light text-front-dark',
  spot: 'border-spot/40 bg-spot-light text-spot-dark',
};

/** A small label, e.g. a compound class or a stain. */
export function Chip({ children, tone = 'neutral', title }: { children: ReactNode; tone?: ChipTone; title?: string }) {
  return (
    <span title={title} className={`inline-flex items-center rounded-full border px-2 py-0.5 text-xs ${tones[tone]}`}>
      {children}
    </span>
  );
}

type ToggleChipProps = Omit<ButtonHTMLAttributes<HTMLButtonElement>, 'onChange'> & {
  pressed: boolean;
  onPressedChange: (pressed: boolean) => void;
};

/** A filter chip that is on or off (aria-pressed); a tick marks "on" so the state never rests on colour alone. */
export function ToggleChip({ pressed, onPressedChange, children, className = '', ...rest }: ToggleChipProps) {
  return (
    <button
      type="button"
      aria-pressed={pressed}
      onClick={() => onPressedChange(!pressed)}
      className={`inline-flex min-h-8 items-center gap-1 rounded-full border px-3 text-sm transition-colors ${
        pressed ? 'border-front bg-front-light text-front-dark' : 'border-line bg-surface text-ink-soft hover:text-ink'
      } ${className}`}
      {...rest}
    >
      {pressed && <span aria-hidden="true">✓</span>}
      {children}
    </button>
  );
}
