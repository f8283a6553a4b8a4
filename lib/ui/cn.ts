import { clsx, type ClassValue } from 'clsx';
import { extendTailwindMerge } from 'tailwind-merge';

// tailwind-merge knows Tailwind's own scale; our theme adds `min-h-touch` / `min-w-touch` (tailwind.config.ts),
// which must win over (and lose to) the other min-height / min-width utilities like any built-in one.
const merge = extendTailwindMerge({
  extend: { classGroups: { 'min-h': [{ 'min-h': ['touch'] }], 'min-w': [{ 'min-w': ['touch'] }] } },
});

/** Class names joined (clsx: strings, arrays, `{ class: condition }`) with conflicting utilities resolved, last wins. */
export function cn(...inputs: ClassValue[]) {
  return merge(clsx(inputs));
}
