import { BUILDER_LISTINGS } from './builders';
import { DECLAN_LISTINGS } from './declan';
import { GWEN_LISTINGS } from './gwen';
import { HAMISH_LISTINGS } from './hamish';
import { HOLLINBRIDGE_LISTINGS } from './hollinbridge';
import { IVO_LISTINGS } from './ivo';
import type { DemoListing } from './kit';
import { OWEN_LISTINGS } from './owen';
import { PRIYA_LISTINGS } from './priya';
import { RUTH_LISTINGS } from './ruth';
import { STOCK_LISTINGS } from './stock';
import { THORNHOLME_LISTINGS } from './thornholme';

export type { DemoListing, DemoState } from './kit';

/**
 * Every invented listing of the demo scenario, interleaved by seller so the newest-first list is mixed. Sellers
 * and clubs are invented; the towns are real (gazetteer ids).
 */
export const DEMO_LISTINGS: readonly DemoListing[] = interleave([
  OWEN_LISTINGS,
  BUILDER_LISTINGS,
  HOLLINBRIDGE_LISTINGS,
  PRIYA_LISTINGS,
  GWEN_LISTINGS,
  DECLAN_LISTINGS,
  HAMISH_LISTINGS,
  RUTH_LISTINGS,
  THORNHOLME_LISTINGS,
  STOCK_LISTINGS,
  IVO_LISTINGS,
]);

function interleave(groups: readonly (readonly DemoListing[])[]): DemoListing[] {
  const longest = Math.max(...groups.map((g) => g.length));
  return Array.from({ length: longest }, (_, i) => groups.flatMap((g) => (g[i] ? [g[i]] : []))).flat();
}
