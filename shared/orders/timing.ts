/** How long a listing is held for a buyer who has started paying; after this the order lapses. */
export const RESERVATION_MINUTES = 30;

/** Days after hand-over (sent or ready to collect) before receipt is confirmed automatically. */
export const CONFIRMATION_DAYS = 7;

/** A builder's deposit unless they set their own, in basis points (30 %). */
export const DEFAULT_DEPOSIT_BPS = 3_000;

/** The platform's rates until an administrator sets others, in basis points. */
export const DEFAULT_COMMISSION_BPS = 800;
export const DEFAULT_BUYER_FEE_BPS = 0;
