import { IsNull } from 'typeorm';
import type { AppContext } from '../../app-context';
import type { MemberReviewsQuery } from '../../../shared/schemas/reviews';
import type { MemberProfileView, ReviewPage } from '../../../shared/types/reviews';
import { notFound } from '../../http/errors';
import { User } from '../users/user.entity';
import { Review } from './review.entity';
import { presentMember, presentReview } from './review.presenter';

/** A member anyone may look at: suspended accounts have no public profile, as their listings are not shown. */
async function publicMember(ctx: AppContext, id: number): Promise<User> {
  const user = await ctx.dataSource.getRepository(User).findOneBy({ id });
  if (!user || user.suspendedAt) throw notFound('That member');
  return user;
}

/** A member's public profile: name, since when, and their rating. */
export async function memberProfile(ctx: AppContext, id: number): Promise<MemberProfileView> {
  return presentMember(await publicMember(ctx, id));
}

/** The reviews of a member that a moderator has not hidden, newest first. */
export async function memberReviews(ctx: AppContext, id: number, query: MemberReviewsQuery): Promise<ReviewPage> {
  await publicMember(ctx, id);
  const [rows, total] = await ctx.dataSource.getRepository(Review).findAndCount({
    where: { subjectId: id, hiddenAt: IsNull() },
    relations: { author: true },
    order: { createdAt: 'DESC', id: 'DESC' },
    skip: (query.page - 1) * query.pageSize,
    take: query.pageSize,
  });
  return { items: rows.map(presentReview), total, page: query.page, pageSize: query.pageSize };
}
