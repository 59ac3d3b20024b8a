import { z } from 'zod';
import type { Role } from './roles';

/**
 * Tasting notes: structured, signed by their author, append-only. A correction is a new note that
 * points at the one it corrects and says why; the original stays as it was.
 */

/** Off-flavours tasters commonly name, with a plain description of how each presents. */
export const OFF_FLAVOURS = {
  diacetyl: { label: 'Diacetyl', hint: 'butter, butterscotch, slick feel' },
  acetaldehyde: { label: 'Acetaldehyde', hint: 'green apple, latex paint' },
  dms: { label: 'DMS', hint: 'cooked corn, cabbage' },
  oxidised: { label: 'Oxidised', hint: 'wet cardboard, sherry, stale' },
  phenolic: { label: 'Phenolic', hint: 'plastic, medicinal, clove where not intended' },
  sulfur: { label: 'Sulfur', hint: 'struck match, rotten egg' },
  astringent: { label: 'Astringent', hint: 'dry, puckering, tea-like tannin' },
  solvent: { label: 'Solvent-like', hint: 'hot alcohol, nail polish' },
  metallic: { label: 'Metallic', hint: 'tinny, coins, blood' },
  infected: { label: 'Infected / sour', hint: 'unintended sourness, vinegar, film' },
  light_struck: { label: 'Light-struck', hint: 'skunky' },
  esters_excess: { label: 'Excess esters', hint: 'banana, pear drops beyond the style' },
} as const;
export type OffFlavour = keyof typeof OFF_FLAVOURS;
export const OFF_FLAVOUR_IDS = Object.keys(OFF_FLAVOURS) as [OffFlavour, ...OffFlavour[]];

export const CLARITY = ['brilliant', 'clear', 'slight haze', 'hazy', 'opaque'] as const;
export const HEAD_RETENTION = ['none', 'poor', 'fair', 'good', 'lasting'] as const;
export const BODY = ['thin', 'light', 'medium', 'full', 'heavy'] as const;
export const CARBONATION_FEEL = ['flat', 'low', 'medium', 'lively', 'spritzy'] as const;

/** Scores run 1 to 5 in half points. */
export const SCORE_MIN = 1;
export const SCORE_MAX = 5;

const text = (label: string, max: number) =>
  z.string().trim().min(1, `Describe the ${label}`).max(max, `Use at most ${max} characters`);
const choice = <T extends readonly [string, ...string[]]>(values: T, label: string) =>
  z.enum(values, { error: `Choose the ${label}` });

export const tastingNoteContentSchema = z.strictObject({
  appearance: z.strictObject({
    colour: text('colour', 80),
    clarity: choice(CLARITY, 'clarity'),
    head: choice(HEAD_RETENTION, 'head'),
  }),
  aroma: text('aroma', 1000),
  flavour: text('flavour', 1000),
  mouthfeel: z.strictObject({
    body: choice(BODY, 'body'),
    carbonation: choice(CARBONATION_FEEL, 'carbonation'),
    notes: z.string().trim().max(500, 'Use at most 500 characters').default(''),
  }),
  overall: text('overall impression', 1000),
  offFlavours: z
    .array(z.enum(OFF_FLAVOUR_IDS, { error: 'Choose off-flavours from the list' }))
    .max(OFF_FLAVOUR_IDS.length)
    .refine((list) => new Set(list).size === list.length, 'Each off-flavour once')
    .default([]),
  score: z
    .number({ error: 'Score: enter a number' })
    .min(SCORE_MIN, `Score must be at least ${SCORE_MIN}`)
    .max(SCORE_MAX, `Score must be at most ${SCORE_MAX}`)
    .multipleOf(0.5, 'Score in half points'),
});
export type TastingNoteContent = z.infer<typeof tastingNoteContentSchema>;

/** What a taster sends. Author and time come from the server: a body naming them is refused. */
export const tastingNoteInputSchema = z
  .strictObject({
    /** Generated on the device: the same key sent twice records one note. */
    idempotencyKey: z
      .string()
      .trim()
      .min(8)
      .max(64)
      .regex(/^[A-Za-z0-9_-]+$/, 'Letters, digits, - and _ only'),
    content: tastingNoteContentSchema,
    /** A correction points at the note it corrects and says why. */
    correctsNoteId: z.number().int().positive().optional(),
    reason: z.string().trim().min(3, 'Say why (at least 3 characters)').max(500).optional(),
  })
  .refine((v) => !v.correctsNoteId || Boolean(v.reason), {
    path: ['reason'],
    message: 'Say why this note corrects the other',
  })
  .refine((v) => Boolean(v.correctsNoteId) || !v.reason, {
    path: ['reason'],
    message: 'A reason belongs to a correction',
  });
export type TastingNoteInput = z.infer<typeof tastingNoteInputSchema>;

export interface TastingNote {
  id: number;
  batchId: number;
  content: TastingNoteContent;
  correctsNoteId: number | null;
  reason: string | null;
  /** Ids of later notes that correct this one. */
  correctedBy: number[];
  signature: {
    authorId: number;
    authorName: string;
    authorRole: Role;
    /** Server time, ISO 8601 UTC. */
    signedAt: string;
    meaning: 'authored';
    /** SHA-256 of exactly what was signed. */
    contentHash: string;
    /** Whether the stored content still matches its hash. */
    valid: boolean;
  };
}

export interface TastingSummary {
  /** Current notes only: a corrected note counts through its correction. */
  tasters: number;
  averageScore: number | null;
  /** The most recent current note's aroma and flavour. */
  aroma: string | null;
  flavour: string | null;
  offFlavours: OffFlavour[];
}
