/**
 * What each page may make a first-time visitor download before it can run: the entry chunk, the page's own lazy
 * chunk, and every chunk and stylesheet they import statically, in KB (1,000 bytes) after gzip.
 *
 * The home page's 170 KB of JavaScript is the figure commonly given for a page to become interactive within
 * about 5 s on a mid-range phone over a slow 4G link (Alex Russell, "Can You Afford It?: Real-world Web
 * Performance Budgets", 2017). The other pages' limits are about 10 % above what they measured when the budget
 * was written (see README "Proof"), so growth is a decision, not an accident: common practice, no source.
 */
export interface RouteBudget {
  /** A name for the table. */
  route: string;
  /** The address a person opens. */
  path: string;
  /** The page component, as the manifest names its source. */
  page: string;
  jsKb: number;
  cssKb: number;
}

export const ROUTE_BUDGETS: RouteBudget[] = [
  { route: 'home', path: '/', page: 'client/pages/home/HomePage.vue', jsKb: 170, cssKb: 15 },
  { route: 'search', path: '/modules', page: 'client/pages/listings/SearchPage.vue', jsKb: 185, cssKb: 22 },
  { route: 'listing', path: '/modules/:id', page: 'client/pages/listings/ListingPage.vue', jsKb: 185, cssKb: 21 },
  { route: 'sell', path: '/sell', page: 'client/pages/listings/SellPage.vue', jsKb: 190, cssKb: 20 },
  { route: 'planner', path: '/planner', page: 'client/pages/planner/PlannerPage.vue', jsKb: 240, cssKb: 27 },
  { route: 'sign-in', path: '/sign-in', page: 'client/pages/auth/SignInPage.vue', jsKb: 155, cssKb: 16 },
];
