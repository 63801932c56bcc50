import type { HTMLAttributes } from 'vue';

/**
 * Element attributes with a `data-testid` (and optional data-* extras) for render functions such as
 * table `row-props`, whose types do not list data-* keys.
 * @example rowProps: (m) => elementHook('member-row', { 'data-email': m.email })
 */
export function elementHook(testId: string, data: Record<`data-${string}`, string> = {}): HTMLAttributes {
  return { ...data, 'data-testid': testId } as HTMLAttributes;
}
