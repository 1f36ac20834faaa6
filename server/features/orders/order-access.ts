import type { EntityManager } from 'typeorm';
import { hasAnyRole, type Role } from '../../../shared/roles';
import type { OrderViewerRole } from '../../../shared/types/orders';
import { notFound } from '../../http/errors';
import { lockOrder } from './order-lifecycle';
import { Order } from './order.entity';

/** The signed-in person asking for an order. */
export interface OrderViewer {
  id: number;
  role: Role;
  ip: string;
}

/** Which side of `order` the viewer is on, or null when they may not see it at all. */
export function viewerRoleOf(order: Order, viewer: OrderViewer): OrderViewerRole | null {
  if (order.buyerId === viewer.id) return 'buyer';
  if (order.sellerId === viewer.id) return 'seller';
  if (order.problemRaisedAt && hasAnyRole(viewer.role, ['moderator'])) return 'moderator';
  return null;
}

/**
 * Load an order the viewer may see: its buyer, its seller, or a moderator once a problem was raised. Anyone else
 * gets the same 404 as for an order that does not exist, so order numbers reveal nothing. With `lock`, the row is
 * held for the rest of the transaction.
 */
export async function loadOrderFor(
  m: EntityManager,
  viewer: OrderViewer,
  orderId: number,
  options: { lock?: boolean } = {},
): Promise<{ order: Order; role: OrderViewerRole }> {
  const order = options.lock ? await lockOrder(m, orderId) : await m.findOneBy(Order, { id: orderId });
  const role = order ? viewerRoleOf(order, viewer) : null;
  if (!order || !role) throw notFound('That order');
  return { order, role };
}
