import { z } from 'zod';

/**
 * Field schemas reused by several concepts (accounts, invitations, later features).
 * Kept apart so account.ts and workspace.ts can both use them without importing each other.
 */

/** Random string id (server uses crypto.randomUUID()). */
export const Id = z.string().min(1).max(100);

/** ISO-8601 timestamp as sent in JSON, e.g. `2025-01-31T09:30:00.000Z`. */
export const IsoDateTime = z.iso.datetime({ offset: true });

/** E-mail address, trimmed and lower-cased before it is checked. */
export const Email = z
  .string()
  .trim()
  .toLowerCase()
  .max(254, 'At most 254 characters')
  .pipe(z.email({ message: 'Enter a valid e-mail address' }));

/** A new password; the length cap keeps key derivation cheap for absurd inputs. */
export const NewPassword = z
  .string()
  .min(10, 'Use at least 10 characters')
  .max(200, 'Use at most 200 characters');

/** A password typed to prove who you are (no length rule, so old passwords still work). */
export const GivenPassword = z.string().min(1, 'Required').max(200, 'Use at most 200 characters');

/**
 * Names and labels are one line of plain text: no control characters (C0, DEL, C1 — `\p{Cc}`) and no
 * text-direction embeddings, overrides or isolates (U+202A–U+202E, U+2066–U+2069), which can make
 * a name read differently from what it is, or break a line of an exported file.
 */
export const plainLine = /^[^\p{Cc}\u202a-\u202e\u2066-\u2069]*$/u;
/** Free text (notes, messages) may keep line breaks and tabs, nothing else of the above. */
export const plainText = /^(?:[\t\n\r]|[^\p{Cc}\u202a-\u202e\u2066-\u2069])*$/u;
export const plainLineMessage = 'Use plain text on one line: no control characters or text-direction marks';
export const plainTextMessage = 'Use plain text: no control characters or text-direction marks';

/** A person's display name. */
export const PersonName = z.string().trim().min(1, 'Required').max(100, 'At most 100 characters').regex(plainLine, plainLineMessage);
