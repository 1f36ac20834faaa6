/** One slot in a row of page links: a page number, or a gap standing for the pages left out. */
export type PageSlot = number | 'gap';

/**
 * The pages to offer under a list: always the first and last, the current one and `around`
 * on each side, with gaps for the rest. pageWindow(6, 20) → [1, 'gap', 5, 6, 7, 'gap', 20].
 */
export function pageWindow(current: number, pageCount: number, around = 1): PageSlot[] {
  const pages = new Set<number>([1, pageCount]);
  for (let page = current - around; page <= current + around; page++) {
    if (page >= 1 && page <= pageCount) pages.add(page);
  }
  const sorted = [...pages].filter((page) => page >= 1).sort((a, b) => a - b);
  const slots: PageSlot[] = [];
  for (const page of sorted) {
    const previous = slots.at(-1);
    if (typeof previous === 'number' && page - previous === 2) slots.push(previous + 1);
    else if (typeof previous === 'number' && page - previous > 2) slots.push('gap');
    slots.push(page);
  }
  return slots;
}
