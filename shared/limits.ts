/** Limits stated to people up front and enforced by the shared schemas. */
export const PASSWORD_MIN_LENGTH = 12;
/** argon2 accepts longer input, but a cap stops hashing megabytes sent as a "password". */
export const PASSWORD_MAX_LENGTH = 128;
export const EMAIL_MAX_LENGTH = 254;
export const DISPLAY_NAME_MIN_LENGTH = 2;
export const DISPLAY_NAME_MAX_LENGTH = 60;
export const REASON_MAX_LENGTH = 500;
export const ADMIN_PAGE_SIZE_MAX = 100;
