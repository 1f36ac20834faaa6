import { z } from 'zod';
import { LISTING_LIMITS as L } from '../listings/limits';
import { CHECKLIST_ITEMS, REPORT_REASONS, SELLER_ACTIONS, SEND_BACK_REASONS } from '../listings/moderation';
import { choiceList, pageField, pageSizeField, plainTextField } from './listing-fields';

const reasonField = plainTextField('reason', L.reasonMin, L.reasonMax);

/** The moderator's answers to the checklist. */
export const checklistSchema = z.strictObject(
  Object.fromEntries(
    CHECKLIST_ITEMS.map((item) => [item, z.boolean({ error: 'Answer this checklist item (true or false).' })]),
  ) as Record<(typeof CHECKLIST_ITEMS)[number], z.ZodBoolean>,
  { error: 'Answer the checklist.' },
);
export type ChecklistAnswers = z.infer<typeof checklistSchema>;

/** POST /api/moderation/listings/:id/approve: only with every checklist item ticked. */
export const approveSchema = z.strictObject({ checklist: checklistSchema }).superRefine((v, ctx) => {
  for (const item of CHECKLIST_ITEMS)
    if (!v.checklist[item])
      ctx.addIssue({
        code: 'custom',
        path: ['checklist', item],
        message: 'A listing is approved only when this holds; otherwise send it back with a reason.',
      });
});
export type ApproveInput = z.infer<typeof approveSchema>;

/** POST /api/moderation/listings/:id/send-back */
export const sendBackSchema = z
  .strictObject({
    reasons: choiceList(SEND_BACK_REASONS, 'reasons', 1),
    note: plainTextField('note to the seller', 0, L.reasonMax).default(''),
    checklist: checklistSchema.optional(),
  })
  .refine((v) => !v.reasons.includes('other') || v.note.length >= L.reasonMin, {
    error: 'Explain "another reason" in the note to the seller.',
    path: ['note'],
  });
export type SendBackInput = z.infer<typeof sendBackSchema>;

/** POST /api/moderation/listings/:id/take-down: withdraw a listing, and warn or suspend its seller. */
export const takeDownSchema = z.strictObject({
  reason: reasonField,
  sellerAction: z.enum(SELLER_ACTIONS, { error: 'Choose what happens to the seller: none, warn or suspend.' }),
});
export type TakeDownInput = z.infer<typeof takeDownSchema>;

/** POST /api/moderation/listings/:id/dismiss-reports: the reports were looked at and the listing stays. */
export const dismissReportsSchema = z.strictObject({ note: reasonField });
export type DismissReportsInput = z.infer<typeof dismissReportsSchema>;

/** POST /api/listings/:id/reports */
export const reportSchema = z
  .strictObject({
    reason: z.enum(REPORT_REASONS, { error: 'Choose why you are reporting this listing.' }),
    details: plainTextField('details', 0, L.notesMax).default(''),
  })
  .refine((v) => v.reason !== 'other' || v.details.length >= 10, {
    error: 'Tell the moderators what is wrong (at least 10 characters).',
    path: ['details'],
  });
export type ReportInput = z.infer<typeof reportSchema>;

/** GET /api/moderation/queue */
export const moderationQueueQuerySchema = z.strictObject({ page: pageField, pageSize: pageSizeField(50, 20) });
export type ModerationQueueQuery = z.infer<typeof moderationQueueQuerySchema>;
