/** A builder profile's review: a member applies, a moderator approves (the member becomes a builder) or declines. */
export const BUILDER_PROFILE_STATES = ['applied', 'approved', 'declined'] as const;
export type BuilderProfileState = (typeof BUILDER_PROFILE_STATES)[number];
