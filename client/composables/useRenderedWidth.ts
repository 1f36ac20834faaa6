import { onBeforeUnmount, onMounted, ref, type Ref } from 'vue';

/**
 * The width of the space an element is drawn in (its parent's box), in CSS pixels, kept up to date as it changes.
 * Drawings use it to keep their labels readable on a phone; measuring the parent rather than the drawing keeps a
 * drawing whose size follows its labels from chasing itself. 0 until measured (and where the browser cannot tell).
 */
export function useRenderedWidth(element: Ref<Element | null>): Ref<number> {
  const width = ref(0);
  let observer: ResizeObserver | null = null;
  onMounted(() => {
    const parent = element.value?.parentElement;
    if (!parent || typeof ResizeObserver === 'undefined') return;
    observer = new ResizeObserver(([entry]) => {
      width.value = entry?.contentRect.width ?? 0;
    });
    observer.observe(parent);
  });
  onBeforeUnmount(() => observer?.disconnect());
  return width;
}

/**
 * How much to enlarge a drawing's text so it reads at least as large as it would at `comfortablePx` wide: 1 on a wide
 * screen, more on a narrow one, at most `cap`.
 */
export function textBoost(renderedPx: number, comfortablePx: number, cap = 2.2): number {
  if (renderedPx <= 0) return 1;
  return Math.min(cap, Math.max(1, comfortablePx / renderedPx));
}
