import type { OrderView } from '../../../shared/types/orders';
import type { AppContext } from '../../app-context';
import { loadOrderFor, type OrderViewer } from './order-access';
import { orderViewOf } from './order.presenter';

/** The order as the viewer now sees it, to answer a move with. */
export async function currentOrderView(ctx: AppContext, viewer: OrderViewer, orderId: number): Promise<OrderView> {
  const m = ctx.dataSource.manager;
  const { order, role } = await loadOrderFor(m, viewer, orderId);
  return orderViewOf(m, order, role);
}
