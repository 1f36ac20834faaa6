import type { Role } from '@shared/roles';
import 'vue-router';

export {};

declare module 'vue-router' {
  /** What each route asks of the visitor, read by the global guard. */
  interface RouteMeta {
    /** Only signed-in people; visitors are sent to sign in first. */
    requiresAuth?: boolean;
    /** Only accounts holding one of these roles (or a role that includes it); implies `requiresAuth`. */
    roles?: Role[];
    /** Only visitors (sign in, join); signed-in people are sent on. */
    guestOnly?: boolean;
    /** Words for the browser tab, before " – Benchwright". */
    title?: string;
  }
}
