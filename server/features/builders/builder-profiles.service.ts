import type { EntityManager } from 'typeorm';
import type { AppContext } from '../../app-context';
import type { BuilderApplicationInput, BuilderProfileListQuery } from '../../../shared/schemas/builders';
import type { BuilderProfileView } from '../../../shared/types/listings';
import type { Page } from '../../../shared/types/user';
import { conflict, notFound, validationFailed } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';
import type { ListingActor } from '../listings/listing-actor';
import { enqueueEmail } from '../mail/mail-outbox';
import { mailTemplates } from '../mail/mail-templates';
import { gazetteer } from '../towns/gazetteer';
import { lockUser } from '../users/user.repository';
import { BuilderProfile } from './builder-profile.entity';
import { presentBuilderProfile } from './builder-profile.presenter';

async function view(m: EntityManager, id: number): Promise<BuilderProfileView> {
  const profile = await m.getRepository(BuilderProfile).findOne({ where: { id }, relations: { user: true } });
  if (!profile) throw notFound('That builder profile');
  return presentBuilderProfile(profile, await gazetteer());
}

/**
 * A member applies (or applies again after a decline, or edits a pending application). Moderators and
 * administrators keep their own role, so they cannot also be builders.
 */
export async function applyForBuilderProfile(ctx: AppContext, actor: ListingActor, input: BuilderApplicationInput) {
  if (actor.role === 'moderator' || actor.role === 'admin')
    throw conflict('role_conflict', 'Moderators and administrators cannot also hold a builder profile.');
  if (!(await gazetteer()).find(input.townId))
    throw validationFailed({ townId: 'Choose the nearest town from the list; this one is not in it.' });
  const id = await ctx.transaction(async (m) => {
    const repo = m.getRepository(BuilderProfile);
    const existing = await repo.findOne({ where: { userId: actor.id }, lock: { mode: 'pessimistic_write' } });
    if (existing?.state === 'approved') throw conflict('already_builder', 'Your builder profile is already approved.');
    const profile = existing ?? repo.create({ userId: actor.id });
    Object.assign(profile, input, { state: 'applied', decidedBy: null, decidedAt: null, decisionNote: null });
    await repo.save(profile);
    await recordAudit(m, {
      actorId: actor.id,
      action: 'builder_profile.applied',
      targetType: 'builder_profile',
      targetId: profile.id,
      ip: actor.ip,
    });
    return profile.id;
  });
  return view(ctx.dataSource.manager, id);
}

export async function myBuilderProfile(ctx: AppContext, actor: ListingActor): Promise<BuilderProfileView> {
  const profile = await ctx.dataSource.getRepository(BuilderProfile).findOneBy({ userId: actor.id });
  if (!profile) throw notFound('Your builder profile');
  return view(ctx.dataSource.manager, profile.id);
}

/** Applications for moderators, oldest first. */
export async function listBuilderProfiles(
  ctx: AppContext,
  query: BuilderProfileListQuery,
): Promise<Page<BuilderProfileView>> {
  const [rows, total] = await ctx.dataSource.getRepository(BuilderProfile).findAndCount({
    where: { state: query.state },
    relations: { user: true },
    order: { createdAt: 'ASC', id: 'ASC' },
    skip: (query.page - 1) * query.pageSize,
    take: query.pageSize,
  });
  const towns = await gazetteer();
  return { items: rows.map((p) => presentBuilderProfile(p, towns)), total, page: query.page, pageSize: query.pageSize };
}

async function lockApplication(m: EntityManager, actor: ListingActor, id: number): Promise<BuilderProfile> {
  const profile = await m.getRepository(BuilderProfile).findOne({ where: { id }, lock: { mode: 'pessimistic_write' } });
  if (!profile) throw notFound('That builder profile');
  if (profile.userId === actor.id) throw conflict('own_account', 'Another moderator must decide on your application.');
  if (profile.state !== 'applied')
    throw conflict('builder_profile_state', `This application is already ${profile.state}.`);
  return profile;
}

/** Approve: the member becomes a builder; both the decision and the role change are audit-logged. */
export async function approveBuilderProfile(ctx: AppContext, actor: ListingActor, id: number) {
  await ctx.transaction(async (m) => {
    const profile = await lockApplication(m, actor, id);
    const user = await lockUser(m, profile.userId);
    if (user.role !== 'member')
      throw conflict('role_conflict', `This account is now a ${user.role}, so it cannot become a builder.`);
    user.role = 'builder';
    await m.save(user);
    Object.assign(profile, { state: 'approved', decidedBy: actor.id, decidedAt: new Date(), decisionNote: null });
    await m.save(profile);
    const audit = { actorId: actor.id, ip: actor.ip };
    await recordAudit(m, { ...audit, action: 'builder_profile.approved', targetType: 'builder_profile', targetId: id });
    await recordAudit(m, {
      ...audit,
      action: 'user.role_changed',
      targetType: 'user',
      targetId: user.id,
      detail: { from: 'member', to: 'builder', reason: 'builder profile approved' },
    });
    const url = `${ctx.config.appOrigin}/listings/new?kind=service`;
    await enqueueEmail(m, user.email, mailTemplates.builderProfileApproved(user.displayName, url));
  });
  return view(ctx.dataSource.manager, id);
}

export async function declineBuilderProfile(ctx: AppContext, actor: ListingActor, id: number, reason: string) {
  await ctx.transaction(async (m) => {
    const profile = await lockApplication(m, actor, id);
    Object.assign(profile, { state: 'declined', decidedBy: actor.id, decidedAt: new Date(), decisionNote: reason });
    await m.save(profile);
    await recordAudit(m, {
      actorId: actor.id,
      action: 'builder_profile.declined',
      targetType: 'builder_profile',
      targetId: id,
      detail: { reason },
      ip: actor.ip,
    });
    const user = await lockUser(m, profile.userId);
    await enqueueEmail(m, user.email, mailTemplates.builderProfileDeclined(user.displayName, reason));
  });
  return view(ctx.dataSource.manager, id);
}
