import { randomBytes } from 'node:crypto';
import type { AppContext } from '../../app-context';
import { conflict, notFound } from '../../http/errors';
import type { SavedPlanSummary, SavedPlanView, SharedPlanView } from '../../../shared/types/plans';
import { SavedPlan } from './saved-plan.entity';

/** How many plans one account may keep; stops a script filling the database. */
export const MAX_PLANS_PER_ACCOUNT = 200;

const shareUrl = (ctx: AppContext, plan: SavedPlan) =>
  plan.shareToken ? `${ctx.config.appOrigin}/planner/shared/${plan.shareToken}` : null;

function summary(ctx: AppContext, plan: SavedPlan): SavedPlanSummary {
  return { id: plan.id, name: plan.name, updatedAt: plan.updatedAt.toISOString(), shareUrl: shareUrl(ctx, plan) };
}

const view = (ctx: AppContext, plan: SavedPlan): SavedPlanView => ({ ...summary(ctx, plan), input: plan.input });

/** A plan belonging to `ownerId`; anyone else's plan answers 404 so its existence does not leak. */
async function ownPlan(ctx: AppContext, ownerId: number, id: number): Promise<SavedPlan> {
  const plan = await ctx.dataSource.getRepository(SavedPlan).findOneBy({ id, ownerId });
  if (!plan) throw notFound('That plan');
  return plan;
}

export async function listPlans(ctx: AppContext, ownerId: number): Promise<SavedPlanSummary[]> {
  const plans = await ctx.dataSource.getRepository(SavedPlan).find({
    where: { ownerId },
    order: { updatedAt: 'DESC' },
    take: MAX_PLANS_PER_ACCOUNT,
  });
  return plans.map((plan) => summary(ctx, plan));
}

export async function getPlan(ctx: AppContext, ownerId: number, id: number): Promise<SavedPlanView> {
  return view(ctx, await ownPlan(ctx, ownerId, id));
}

export async function createPlan(
  ctx: AppContext,
  ownerId: number,
  name: string,
  input: unknown,
): Promise<SavedPlanView> {
  const repo = ctx.dataSource.getRepository(SavedPlan);
  if ((await repo.countBy({ ownerId })) >= MAX_PLANS_PER_ACCOUNT) {
    throw conflict(
      'plan_limit',
      `You have ${MAX_PLANS_PER_ACCOUNT} saved plans, the most an account can keep. Delete one first.`,
    );
  }
  const plan = await repo.save(
    repo.create({ ownerId, name, input: input as Record<string, unknown>, shareToken: null }),
  );
  return view(ctx, plan);
}

export async function updatePlan(
  ctx: AppContext,
  ownerId: number,
  id: number,
  name: string,
  input: unknown,
): Promise<SavedPlanView> {
  const plan = await ownPlan(ctx, ownerId, id);
  plan.name = name;
  plan.input = input as Record<string, unknown>;
  return view(ctx, await ctx.dataSource.getRepository(SavedPlan).save(plan));
}

export async function deletePlan(ctx: AppContext, ownerId: number, id: number): Promise<void> {
  const plan = await ownPlan(ctx, ownerId, id);
  await ctx.dataSource.getRepository(SavedPlan).remove(plan);
}

/** Turn the read-only link on (a new unguessable token each time) or off. */
export async function setSharing(
  ctx: AppContext,
  ownerId: number,
  id: number,
  shared: boolean,
): Promise<SavedPlanView> {
  const plan = await ownPlan(ctx, ownerId, id);
  plan.shareToken = shared ? randomBytes(32).toString('base64url') : null;
  return view(ctx, await ctx.dataSource.getRepository(SavedPlan).save(plan));
}

export async function getSharedPlan(ctx: AppContext, token: string): Promise<SharedPlanView> {
  const plan = await ctx.dataSource.getRepository(SavedPlan).findOne({
    where: { shareToken: token },
    relations: { owner: true },
  });
  if (!plan) throw notFound('That shared plan');
  return {
    name: plan.name,
    input: plan.input,
    sharedBy: plan.owner?.displayName ?? 'A Benchwright member',
    updatedAt: plan.updatedAt.toISOString(),
  };
}
