import { z } from 'zod';
import {
  DISPLAY_NAME_MAX_LENGTH,
  DISPLAY_NAME_MIN_LENGTH,
  EMAIL_MAX_LENGTH,
  PASSWORD_MAX_LENGTH,
  PASSWORD_MIN_LENGTH,
} from '../limits';

/** Field rules shared by every form that asks for them. Messages name the cause and the fix. */
export const emailField = z
  .string({ error: 'Enter your e-mail address.' })
  .trim()
  .min(1, { error: 'Enter your e-mail address.' })
  .max(EMAIL_MAX_LENGTH, { error: `E-mail address must be at most ${EMAIL_MAX_LENGTH} characters.` })
  .pipe(z.email({ error: 'Enter an e-mail address like name@example.org.' }))
  .transform((value) => value.toLowerCase());

/** A new password: length only here; the server also refuses common passwords. */
export const newPasswordField = z
  .string({ error: 'Enter a password.' })
  .min(PASSWORD_MIN_LENGTH, { error: `Password must be at least ${PASSWORD_MIN_LENGTH} characters.` })
  .max(PASSWORD_MAX_LENGTH, { error: `Password must be at most ${PASSWORD_MAX_LENGTH} characters.` });

/** An existing password being typed in: any length accepted up to the cap. */
export const currentPasswordField = z
  .string({ error: 'Enter your password.' })
  .min(1, { error: 'Enter your password.' })
  .max(PASSWORD_MAX_LENGTH, { error: `Password must be at most ${PASSWORD_MAX_LENGTH} characters.` });

export const displayNameField = z
  .string({ error: 'Enter the name other members will see.' })
  .trim()
  .min(DISPLAY_NAME_MIN_LENGTH, {
    error: `Name must be at least ${DISPLAY_NAME_MIN_LENGTH} characters.`,
  })
  .max(DISPLAY_NAME_MAX_LENGTH, {
    error: `Name must be at most ${DISPLAY_NAME_MAX_LENGTH} characters.`,
  });

/** Opaque one-time token from an e-mailed link. */
export const tokenField = z
  .string({ error: 'The link is missing its code.' })
  .regex(/^[A-Za-z0-9_-]{20,128}$/, { error: 'This link is not valid. Ask for a new one.' });
