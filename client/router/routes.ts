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
