import { useState } from 'react';
import { Link } from 'react-router-dom';

const boxes = {
  sm: 'w-24',
  md: 'w-40',
  lg: 'w-72',
} as const;

interface StructureImageProps {
  compoundId: number;
  /** Compound name for the alt text and link label; "compound <id>" when unknown. */
  name?: string;
  size?: keyof typeof boxes;
  /** Link to the compound page (default true); false inside a link of its own. */
  link?: boolean;
  className?: string;
}

/**
 * A compound's depiction from the server (`/api/compounds/:id/svg`), in a fixed 4 : 3 box so rows do
 * not jump while it loads, and linked to the compound page: a structure is always clickable.
 */
export function StructureImage({ compoundId, name, size = 'md', link = true, className = '' }: StructureImageProps) {
  const [failed, setFailed] = useState(false);
  const label = name ?? `compound ${compoundId}`;
  const picture = (
    <span
      className={`relative block aspect-[4/3] overflow-hidden rounded-plate border border-line bg-surface ${boxes[size]} ${className}`}
    >
      {failed ? (
        <span className="absolute inset-0 grid place-items-center px-2 text-center text-2xs text-ink-soft">
          No depiction for {label}
        </span>
      ) : (
        <img
          src={`/api/compounds/${compoundId}/svg`}
          alt={`Structure of ${label}`}
          loading="lazy"
          decoding="async"
          width={400}
          height={300}
          onError={() => setFailed(true)}
          className="absolute inset-0 h-full w-full object-contain p-1"
        />
      )}
    </span>
  );
  if (!link) return picture;
  return (
    <Link
      to={`/compounds/${compoundId}`}
      className="inline-block rounded-plate hover:opacity-90"
      title={`Open ${label}`}
    >
      {picture}
    </Link>
  );
}
