import { carbonylAndOxygenClasses } from './compound-classes-carbonyl-oxygen';
import { nitrogenAndAromaticClasses } from './compound-classes-nitrogen-aromatic';
import { otherElementClasses } from './compound-classes-other-elements';

import type { CompoundClass, CompoundClassKey } from './compound-class-types';

export { compoundClassKeys, type CompoundClass, type CompoundClassKey } from './compound-class-types';

/** All compound classes, in catalogue order. Sources: IUPAC functional-class names; definitions common practice. */
export const compoundClasses: readonly CompoundClass[] = [
  ...carbonylAndOxygenClasses,
  ...nitrogenAndAromaticClasses,
  ...otherElementClasses,
];

const byKey = new Map(compoundClasses.map((entry) => [entry.key, entry]));

/** The class with this key, or undefined. */
export function compoundClassByKey(key: string): CompoundClass | undefined {
  return byKey.get(key as CompoundClassKey);
}
