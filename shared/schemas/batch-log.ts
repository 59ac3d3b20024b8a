import { z } from 'zod';
import type { QuantityId } from '../quantities';
import { quantityField } from '../quantities/field';

/**
 * Batch log entries: the shapes a device may send. Who and when (author, role, received time) come from
 * the server and are refused in a body (every object here is strict). Other areas add their kinds to
 * LOG_ENTRY_INPUTS below (e.g. cellar readings and actions); the brew-day kinds are listed in BREW_DAY_KINDS.
 */

/** What a signature on an entry means. */
export const SIGNATURE_MEANINGS = ['performed', 'verified', 'reviewed'] as const;
export type SignatureMeaning = (typeof SIGNATURE_MEANINGS)[number];
export const MEANING_LABELS: Record<SignatureMeaning, string> = {
  performed: 'Performed by',
  verified: 'Verified by',
  reviewed: 'Reviewed by',
};

/** Every kind an entry can have, including those only the server writes (sign_off). */
export const LOG_ENTRY_KINDS = [
  'step',
  'measurement',
  'note',
  'correction',
  'sign_off',
  'reading',
  'action',
  'packaging',
] as const;
export type LogEntryKind = (typeof LOG_ENTRY_KINDS)[number];
/** Brew-day kinds: after the head brewer signs the brew day off, only corrections may follow them. */
export const BREW_DAY_KINDS: readonly string[] = ['step', 'measurement', 'note'];
/**
 * The brew-day kinds a sign-off closes: after it, steps and measurements are added only as corrections. A note may
 * still follow (e.g. an entry the server refused after the sign-off, sent again as a note): it comes after the
 * signature in the chain, so it never changes what was signed.
 */
export const CLOSED_BY_SIGN_OFF: readonly string[] = ['step', 'measurement'];

/**
 * What each measurement is: the API refuses anything outside its quantity's limits, and the tablet checks the
 * same limits (worded in the units it shows) before an entry is kept.
 */
export const MEASURES = {
  tempC: { quantity: 'temperature', label: 'Temperature' },
  volumeL: { quantity: 'volume', label: 'Volume' },
  gravitySg: { quantity: 'gravity', label: 'Gravity' },
  ph: { quantity: 'ph', label: 'pH' },
} as const satisfies Record<string, { quantity: QuantityId; label: string }>;
const measured = (key: keyof typeof MEASURES) => quantityField(MEASURES[key].quantity, { label: MEASURES[key].label });

/** Measurements in SI (the screen converts from the brewery's units): °C, L, specific gravity, pH. */
export const measurementsSchema = z
  .strictObject({
    tempC: measured('tempC').optional(),
    volumeL: measured('volumeL').optional(),
    gravitySg: measured('gravitySg').optional(),
    ph: measured('ph').optional(),
  })
  .refine((m) => Object.keys(m).length > 0, 'Enter at least one measurement');
export type Measurements = z.infer<typeof measurementsSchema>;

const stepKey = z
  .string()
  .trim()
  .min(1)
  .max(64)
  .regex(/^[a-z0-9-]+$/, 'Step keys are lower-case letters, digits and dashes');
const noteText = z.string().trim().min(1, 'Write the note').max(2000, 'Use at most 2000 characters');
const reason = z.string().trim().min(3, 'Say why (at least 3 characters)').max(500, 'Use at most 500 characters');
const meaning = z.enum(['performed', 'verified'], { error: 'Meaning is performed or verified' }).default('performed');

export const stepEntrySchema = z.strictObject({
  kind: z.literal('step'),
  stepKey,
  label: z.string().trim().min(1).max(160),
  measurements: measurementsSchema.optional(),
  note: noteText.optional(),
  meaning,
});

export const measurementEntrySchema = z.strictObject({
  kind: z.literal('measurement'),
  stepKey: stepKey.optional(),
  label: z.string().trim().min(1).max(160),
  measurements: measurementsSchema,
  meaning,
});

export const noteEntrySchema = z.strictObject({
  kind: z.literal('note'),
  text: noteText,
  /** A deviation from the plan ("stuck sparge, added rice hulls"). */
  deviation: z.boolean().default(false),
  meaning,
});
export type NoteEntryInput = z.infer<typeof noteEntrySchema>;

/** A correction never changes the entry it corrects: it is a new entry that points at it, with a reason. */
export const correctionEntrySchema = z.strictObject({
  kind: z.literal('correction'),
  correctsEntryId: z.number().int().positive(),
  reason,
  measurements: measurementsSchema.optional(),
  note: noteText.optional(),
  meaning,
});

/** The kinds a device may post. Areas add their schemas here. */
export const LOG_ENTRY_INPUTS = [
  stepEntrySchema,
  measurementEntrySchema,
  noteEntrySchema,
  correctionEntrySchema,
] as const;
export const logEntryInputSchema = z.discriminatedUnion('kind', LOG_ENTRY_INPUTS);
export type LogEntryInput = z.infer<typeof logEntryInputSchema>;

/**
 * Metadata every signed write carries in headers (set by the client outbox):
 * `Idempotency-Key`, `X-Captured-At` (ISO time on the device) and `X-Device-Id`.
 */
export const writeMetaSchema = z.strictObject({
  idempotencyKey: z.string().regex(/^[A-Za-z0-9_-]{16,64}$/, 'Idempotency-Key must be 16–64 letters, digits, - or _'),
  capturedAt: z.iso
    .datetime({ offset: true, error: 'X-Captured-At must be an ISO date-time' })
    .transform((s) => new Date(s)),
  deviceId: z.string().regex(/^[A-Za-z0-9_-]{8,64}$/, 'X-Device-Id must be 8–64 letters, digits, - or _'),
});
export type WriteMeta = z.infer<typeof writeMetaSchema>;

/** A sign-off: the head brewer re-enters their password at that moment. */
export const signOffSchema = z.strictObject({
  password: z.string().min(1, 'Enter your password').max(128),
});
export type SignOffInput = z.infer<typeof signOffSchema>;

/** A log entry as the API returns it. */
export interface LogEntry {
  id: number;
  batchId: number;
  sequence: number;
  kind: string;
  stepKey: string | null;
  data: Record<string, unknown>;
  correctsEntryId: number | null;
  reason: string | null;
  authorId: number;
  authorRole: string;
  authorName: string;
  meaning: SignatureMeaning;
  capturedAt: string;
  receivedAt: string;
  deviceId: string;
  late: boolean;
  hash: string;
  /** Set when a later correction points at this entry. */
  correctedByIds: number[];
}

/** A signature as shown on screen and on the printed record. */
export interface Signature {
  entryId: number;
  signerName: string;
  signerRole: string;
  meaning: SignatureMeaning;
  signedAt: string;
  /** SHA-256 of exactly what was signed. */
  contentSha256: string;
  /** False when what was signed has changed since. */
  valid: boolean;
}

export interface ChainCheck {
  ok: boolean;
  checked: number;
  /** The first entry whose stored hash does not match its content or its predecessor. */
  firstBad: { entryId: number; sequence: number; problem: string } | null;
}
