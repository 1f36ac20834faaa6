import { describe, expect, it } from 'vitest';
import { pageWindow } from '@/utils/page-window';

describe('the page links under a list', () => {
  it('lists every page when there are only a few', () => {
    expect(pageWindow(2, 4)).toEqual([1, 2, 3, 4]);
  });

  it('keeps the first, the last and the neighbours of the current page, with gaps between', () => {
    expect(pageWindow(6, 20)).toEqual([1, 'gap', 5, 6, 7, 'gap', 20]);
  });

  it('shows a single missing page rather than a gap', () => {
    expect(pageWindow(4, 20)).toEqual([1, 2, 3, 4, 5, 'gap', 20]);
  });

  it('offers just page 1 when there is one page', () => {
    expect(pageWindow(1, 1)).toEqual([1]);
  });
});
