import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';

/**
 * A quiet caution under conditions that involve a hazardous solvent, stain, UV lamp or pressure.
 * It points to the cautions page and defers to local rules and safety data sheets.
 */
export function HazardLine({ children }: { children: ReactNode }) {
  return (
    <p className="flex items-start gap-1.5 text-xs text-ink-soft">
      <span aria-hidden="true" className="text-partial">
        ▲
      </span>
      <span>
        <span className="sr-only">Caution: </span>
        {children} Follow the safety data sheets, local rules and your safety office.{' '}
        <Link to="/cautions" className="text-front underline underline-offset-2">
          Lab cautions
        </Link>
      </span>
    </p>
  );
}
