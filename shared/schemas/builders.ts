import { z } from 'zod';
import { BUILDER_PROFILE_STATES } from '../listings/builders';
import { LISTING_LIMITS as L } from '../listings/limits';
import { BUILD_KINDS } from '../listings/vocabulary';
import { choiceList, pageField, pageSizeField, plainTextField, townIdField } from './listing-fields';

/** POST /api/builder-profiles: a member applies to offer build services. */
export const builderApplicationSchema = z.strictObject({
  businessName: plainTextField('business name', 2, 80),
  about: plainTextField('description of your work', 30, 2000),
  townId: townIdField,
  builds: choiceList(BUILD_KINDS, 'kinds of work you take on', 1),
});
export type BuilderApplicationInput = z.infer<typeof builderApplicationSchema>;

/** POST /api/builder-profiles/:id/decline */
export const builderDeclineSchema = z.strictObject({ reason: plainTextField('reason', L.reasonMin, L.reasonMax) });
export type BuilderDeclineInput = z.infer<typeof builderDeclineSchema>;

/** GET /api/builder-profiles (moderators) */
export const builderProfileListQuerySchema = z.strictObject({
  state: z.enum(BUILDER_PROFILE_STATES, { error: 'Choose applied, approved or declined.' }).default('applied'),
  page: pageField,
  pageSize: pageSizeField(100, 25),
});
export type BuilderProfileListQuery = z.infer<typeof builderProfileListQuerySchema>;

/** Route parameter `:id` of a builder profile. */
export const builderProfileIdParamSchema = z.strictObject({
  id: z.coerce
    .number({ error: 'Unknown builder profile.' })
    .int({ error: 'Unknown builder profile.' })
    .positive({ error: 'Unknown builder profile.' })
    .max(4_294_967_295, { error: 'Unknown builder profile.' }),
});
