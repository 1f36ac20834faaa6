import type { EntityManager } from 'typeorm';
import { ORDER_STATE_LABELS } from '../../../shared/orders/states';
import {
  BUILD_STAGE_LABELS,
  BUILD_STAGES,
  type BuildStage,
  type BuildStageInput,
} from '../../../shared/schemas/quotes';
import type { BuildStageEntry, BuildView } from '../../../shared/types/quotes';
import type { Currency } from '../../../shared/listings/vocabulary';
import type { AppContext } from '../../app-context';
import { conflict, forbidden, notFound } from '../../http/errors';
import type { ListingActor } from '../listings/listing-actor';
import { enqueueEmail } from '../mail/mail-outbox';
import { mailTemplates } from '../mail/mail-templates';
import { dueNow } from '../orders/order-due';
import { localPayments } from '../orders/order-payments.service';
import { OrderEvent } from '../orders/order-event.entity';
import { lockOrder, moveOrder, noteOrderEvent } from '../orders/order-lifecycle';
import { Order } from '../orders/order.entity';
import { User } from '../users/user.entity';
import { QuoteRequest } from './quote-request.entity';
import { builderNames } from './quote-records';
import { presentQuotes } from './quote-request-view.service';
import { Quote } from './quote.entity';

/** Stages recorded as history notes: the note starts with the stage's label. "Ready" is the finishBuild move. */
const NOTED: readonly BuildStage[] = ['materials_bought', 'frames_built'];
const noteText = (stage: BuildStage, note: string) =>
  note ? `${BUILD_STAGE_LABELS[stage]}: ${note}` : BUILD_STAGE_LABELS[stage];

function stageOf(event: OrderEvent): BuildStageEntry | null {
  const at = event.createdAt.toISOString();
  if (event.move === 'finishBuild')
    return { stage: 'ready', label: BUILD_STAGE_LABELS.ready, note: event.note ?? '', at };
  if (event.move !== 'stage') return null;
  const stage = NOTED.find((s) => event.note?.startsWith(BUILD_STAGE_LABELS[s]));
  if (!stage) return null;
  const note = event.note!.slice(BUILD_STAGE_LABELS[stage].length).replace(/^: /, '');
  return { stage, label: BUILD_STAGE_LABELS[stage], note, at };
}

async function stagesOf(m: EntityManager, orderId: number): Promise<BuildStageEntry[]> {
  const events = await m.find(OrderEvent, { where: { orderId }, order: { id: 'ASC' } });
  return events.map(stageOf).filter((s): s is BuildStageEntry => s !== null);
}

/** What the builder may record next: the first noted stage not yet recorded, and "ready", while building. */
function nextStages(order: Order, done: readonly BuildStageEntry[]): BuildStage[] {
  if (order.state !== 'in_build') return [];
  const recorded = new Set(done.map((s) => s.stage));
  const next = NOTED.find((s) => !recorded.has(s));
  return [...(next ? [next] : []), 'ready'];
}

/** A build order the actor is party to; anything else (another's order, a module order) answers 404. */
async function partyOrder(m: EntityManager, actor: ListingActor, id: number, lock: boolean): Promise<Order> {
  const order = lock ? await lockOrder(m, id) : await m.findOneBy(Order, { id });
  if (!order || order.kind !== 'build' || (order.buyerId !== actor.id && order.sellerId !== actor.id))
    throw notFound('That build order');
  return order;
}

/** GET /api/builds/:id: the build's money, stages and what is due, for its buyer and builder. */
export async function getBuild(ctx: AppContext, actor: ListingActor, id: number): Promise<BuildView> {
  const m = ctx.dataSource.manager;
  const order = await partyOrder(m, actor, id, false);
  const quote = await m.findOneByOrFail(Quote, { id: order.quoteId! });
  const request = await m.findOneByOrFail(QuoteRequest, { id: quote.requestId });
  const stages = await stagesOf(m, order.id);
  const balanceMinor = order.totalMinor - order.depositMinor;
  const owed = dueNow(order);
  const due = owed && owed.purpose !== 'full' ? { purpose: owed.purpose, amountMinor: owed.amountMinor } : null;
  const isBuilder = order.sellerId === actor.id;
  return {
    orderId: order.id,
    state: order.state,
    stateLabel: ORDER_STATE_LABELS[order.state],
    viewerRole: isBuilder ? 'builder' : 'buyer',
    handover: order.handover,
    planName: request.planName,
    planInput: request.planInput,
    quote: (await presentQuotes(m, [quote]))[0]!,
    currency: order.currency as Currency,
    totalMinor: order.totalMinor,
    depositMinor: order.depositMinor,
    balanceMinor,
    testCards: localPayments(ctx.config),
    due,
    stages,
    nextStages: isBuilder ? nextStages(order, stages) : [],
  };
}

/**
 * POST /api/builds/:id/stages: the builder records a stage while building. "Materials bought" and "frames
 * built" are history notes, once each and in that order; "ready" moves the order to wait for the balance. The
 * buyer is e-mailed a link at each stage.
 */
export async function recordStage(ctx: AppContext, actor: ListingActor, id: number, input: BuildStageInput) {
  await ctx.transaction(async (m) => {
    const order = await partyOrder(m, actor, id, true);
    if (order.sellerId !== actor.id) throw forbidden('Only the builder records the stages of a build.');
    const by = { as: 'seller' as const, id: actor.id, ip: actor.ip };
    if (input.stage === 'ready') {
      await moveOrder(m, order, 'finishBuild', by, input.note || null);
      const buyer = await m.findOneByOrFail(User, { id: order.buyerId });
      const quote = await m.findOneByOrFail(Quote, { id: order.quoteId! });
      const request = await m.findOneByOrFail(QuoteRequest, { id: quote.requestId });
      const builder = (await builderNames(m, [actor.id])).get(actor.id)!.businessName;
      const balance = new Intl.NumberFormat('en-GB', { style: 'currency', currency: order.currency }).format(
        (order.totalMinor - order.depositMinor) / 100,
      );
      const url = `${ctx.config.appOrigin}/builds/${order.id}`;
      const mail = mailTemplates.buildReady(buyer.displayName, builder, request.planName, balance, url);
      await enqueueEmail(m, buyer.email, mail);
      return;
    }
    if (order.state !== 'in_build')
      throw conflict(
        'order_state',
        `This order is “${ORDER_STATE_LABELS[order.state]}”, so build stages cannot be recorded. That is possible only while it is “${ORDER_STATE_LABELS.in_build}”.`,
      );
    const allowed = nextStages(order, await stagesOf(m, order.id));
    if (!allowed.includes(input.stage))
      throw conflict(
        'stage_order',
        `“${BUILD_STAGE_LABELS[input.stage]}” is already recorded or comes later. Record the stages in order: ${BUILD_STAGES.map((s) => BUILD_STAGE_LABELS[s]).join(', ')}.`,
      );
    await noteOrderEvent(m, order, 'stage', by, noteText(input.stage, input.note));
    const buyer = await m.findOneByOrFail(User, { id: order.buyerId });
    const quote = await m.findOneByOrFail(Quote, { id: order.quoteId! });
    const request = await m.findOneByOrFail(QuoteRequest, { id: quote.requestId });
    const builder = (await builderNames(m, [actor.id])).get(actor.id)!.businessName;
    const url = `${ctx.config.appOrigin}/builds/${order.id}`;
    const label = BUILD_STAGE_LABELS[input.stage];
    await enqueueEmail(
      m,
      buyer.email,
      mailTemplates.buildStage(buyer.displayName, builder, request.planName, label, url),
    );
  });
  return getBuild(ctx, actor, id);
}
