import { z } from 'zod';

/**
 * What a signature means, in the words the signer agrees to. Kept as a list so later sign-offs
 * (a deviation's disposition) add their own meaning instead of reusing this one.
 */
export const SIGNATURE_MEANINGS = ['approved for production'] as const;
export const SignatureMeaningSchema = z.enum(SIGNATURE_MEANINGS, { error: 'Sign with the meaning “approved for production”.' });
export type SignatureMeaning = z.infer<typeof SignatureMeaningSchema>;

/** Lowercase hex SHA-256, e.g. of a recipe version's canonical JSON content. */
export const ContentHashSchema = z.string({ error: 'contentHash must be text.' }).regex(/^[0-9a-f]{64}$/, 'contentHash is a 64-character hex SHA-256.');

/**
 * An e-signature: who (with the name as printed when they signed), what it means, when, and the
 * exact record version signed (entity and the hash of its content).
 */
export const SignatureSchema = z.object({
  id: z.number().int(),
  userId: z.number().int(),
  printedName: z.string(),
  meaning: SignatureMeaningSchema,
  signedAt: z.string(),
  entityType: z.string(),
  entityId: z.number().int(),
  contentHash: ContentHashSchema,
});
export type Signature = z.infer<typeof SignatureSchema>;

/**
 * Releasing a version is a signature: the password again, and the meaning. `contentHash` is the
 * hash the reviewer was looking at; when given and the version has changed since, nothing is signed.
 */
export const ReleaseVersionInputSchema = z.object({
  password: z.string({ error: 'Enter your password to sign.' }).min(1, 'Enter your password to sign.').max(200, 'Password can be at most 200 characters.'),
  meaning: SignatureMeaningSchema,
  contentHash: ContentHashSchema.optional(),
});
export type ReleaseVersionInput = z.infer<typeof ReleaseVersionInputSchema>;
