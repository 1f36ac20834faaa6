import type { RouteRecordRaw } from 'vue-router';

/** Every page of the client: named, and loaded only when first visited. */
export const routes: RouteRecordRaw[] = [
  {
    path: '/',
    name: 'home',
    component: () => import('@/pages/home/HomePage.vue'),
    meta: { title: 'Baseboard modules and benchwork' },
  },
  {
    path: '/sign-in',
    name: 'sign-in',
    component: () => import('@/pages/auth/SignInPage.vue'),
    meta: { guestOnly: true, title: 'Sign in' },
  },
  {
    path: '/join',
    name: 'sign-up',
    component: () => import('@/pages/auth/SignUpPage.vue'),
    meta: { guestOnly: true, title: 'Join' },
  },
  {
    path: '/verify-email',
    name: 'verify-email',
    component: () => import('@/pages/auth/VerifyEmailPage.vue'),
    meta: { title: 'Confirm your e-mail address' },
  },
  {
    path: '/forgot-password',
    name: 'forgot-password',
    component: () => import('@/pages/auth/ForgotPasswordPage.vue'),
    meta: { title: 'Forgotten password' },
  },
  {
    path: '/reset-password',
    name: 'reset-password',
    component: () => import('@/pages/auth/ResetPasswordPage.vue'),
    meta: { title: 'Choose a new password' },
  },
  {
    path: '/account',
    name: 'account',
    component: () => import('@/pages/account/AccountPage.vue'),
    meta: { requiresAuth: true, title: 'My account' },
  },
  {
    path: '/account/confirm-email',
    name: 'confirm-email-change',
    component: () => import('@/pages/account/ConfirmEmailChangePage.vue'),
    meta: { title: 'Confirm your new e-mail address' },
  },
  {
    path: '/admin/people',
    name: 'admin-users',
    component: () => import('@/pages/admin/PeopleAndRolesPage.vue'),
    meta: { roles: ['admin'], title: 'People & roles' },
  },
  {
    path: '/audit',
    name: 'audit',
    component: () => import('@/pages/audit/AuditTrailPage.vue'),
    meta: { roles: ['moderator'], title: 'Audit trail' },
  },
  {
    path: '/planner',
    name: 'planner',
    component: () => import('@/pages/planner/PlannerPage.vue'),
    meta: { title: 'Frame planner' },
  },
  {
    path: '/planner/shared/:token',
    name: 'planner-shared',
    component: () => import('@/pages/planner/SharedPlanPage.vue'),
    meta: { title: 'Shared frame plan' },
  },
  {
    path: '/planner/:id(\\d+)',
    name: 'planner-saved',
    component: () => import('@/pages/planner/PlannerPage.vue'),
    meta: { requiresAuth: true, title: 'Frame planner' },
  },
  {
    path: '/plans',
    name: 'plans',
    component: () => import('@/pages/plans/MyPlansPage.vue'),
    meta: { requiresAuth: true, title: 'My plans' },
  },
  {
    path: '/modules',
    name: 'search',
    component: () => import('@/pages/listings/SearchPage.vue'),
    meta: { title: 'Find modules' },
  },
  {
    path: '/modules/:id(\\d+)',
    name: 'listing',
    component: () => import('@/pages/listings/ListingPage.vue'),
    meta: { title: 'Listing' },
  },
  {
    path: '/modules/:id(\\d+)/edit',
    name: 'listing-edit',
    component: () => import('@/pages/listings/SellPage.vue'),
    meta: { requiresAuth: true, title: 'Edit a listing' },
  },
  {
    path: '/sell',
    name: 'sell',
    component: () => import('@/pages/listings/SellPage.vue'),
    meta: { requiresAuth: true, title: 'Sell a module' },
  },
  {
    path: '/my/listings',
    name: 'my-listings',
    component: () => import('@/pages/listings/MyListingsPage.vue'),
    meta: { requiresAuth: true, title: 'My listings' },
  },
  {
    path: '/my/shortlist',
    name: 'my-shortlist',
    component: () => import('@/pages/shortlist/MyShortlistPage.vue'),
    meta: { requiresAuth: true, title: 'My shortlist' },
  },
  {
    path: '/review',
    name: 'review',
    component: () => import('@/pages/review/ReviewDeskPage.vue'),
    meta: { roles: ['moderator'], title: 'Review desk' },
  },
  {
    path: '/builder/apply',
    name: 'builder-apply',
    component: () => import('@/pages/builder/BuilderApplyPage.vue'),
    meta: { requiresAuth: true, title: 'Become a builder' },
  },
  // Addresses the server's e-mails use for listings.
  { path: '/listings/new', redirect: (to) => ({ name: 'sell', query: to.query }) },
  { path: '/listings/:id(\\d+)', redirect: (to) => ({ name: 'listing', params: { id: to.params.id } }) },
  {
    path: '/forbidden',
    name: 'forbidden',
    component: () => import('@/pages/errors/ForbiddenPage.vue'),
    meta: { title: 'Not for this account' },
  },
  {
    path: '/:pathMatch(.*)*',
    name: 'not-found',
    component: () => import('@/pages/errors/NotFoundPage.vue'),
    meta: { title: 'Page not found' },
  },
];
