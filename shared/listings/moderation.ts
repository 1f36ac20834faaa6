/** What moderators check, the reasons they give, and what members may report. */

/** The checklist answered for every decision. Approval needs every item ticked. */
export const CHECKLIST_ITEMS = ['photosShowItem', 'plausiblePrice', 'nothingProhibited', 'noContactDetails'] as const;
export type ChecklistItem = (typeof CHECKLIST_ITEMS)[number];
export const CHECKLIST_LABELS: Record<ChecklistItem, string> = {
  photosShowItem: 'The photos show the item being sold',
  plausiblePrice: 'The price is plausible for what is described',
  nothingProhibited: 'Nothing prohibited is offered',
  noContactDetails: 'No contact details in the text or photos',
};

/** Why a listing goes back to its seller. */
export const SEND_BACK_REASONS = [
  'photos-unclear',
  'price-implausible',
  'prohibited-item',
  'contact-details',
  'details-missing',
  'other',
] as const;
export type SendBackReason = (typeof SEND_BACK_REASONS)[number];
export const SEND_BACK_REASON_LABELS: Record<SendBackReason, string> = {
  'photos-unclear': 'The photos do not clearly show the item',
  'price-implausible': 'The price does not look right for what is described',
  'prohibited-item': 'Something in the listing cannot be sold here',
  'contact-details': 'Contact details must not appear in the listing; buyers ask through Benchwright',
  'details-missing': 'Some details a buyer needs are missing or unclear',
  other: 'Another reason (see the note)',
};

/** Why a member reports a listing. */
export const REPORT_REASONS = [
  'misdescribed',
  'prohibited',
  'contact-details',
  'suspected-fraud',
  'duplicate',
  'other',
] as const;
export type ReportReason = (typeof REPORT_REASONS)[number];
export const REPORT_REASON_LABELS: Record<ReportReason, string> = {
  misdescribed: 'Not as described',
  prohibited: 'Something that cannot be sold here',
  'contact-details': 'Contact details in the listing',
  'suspected-fraud': 'Looks like a scam',
  duplicate: 'Listed more than once',
  other: 'Something else',
};

/** What a moderator does about the seller when withdrawing a listing. */
export const SELLER_ACTIONS = ['none', 'warn', 'suspend'] as const;
export type SellerAction = (typeof SELLER_ACTIONS)[number];

/** The decisions recorded in a listing's moderation history. */
export const DECISIONS = ['approved', 'sent_back', 'taken_down', 'reports_dismissed'] as const;
export type Decision = (typeof DECISIONS)[number];
