import { z } from 'zod';
import { ROLES } from './roles';

/** Password length rules (NIST SP 800-63B: at least 8, allow at least 64, no composition rules). */
export const PASSWORD_MIN = 8;
export const PASSWORD_MAX = 128;

export const email = z
  .string()
  .trim()
  .toLowerCase()
  .max(254, 'E-mail address is too long')
  .pipe(z.email('Enter a valid e-mail address'));

export const password = z
  .string()
  .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters`)
  .max(PASSWORD_MAX, `Use at most ${PASSWORD_MAX} characters`);

export const displayName = z.string().trim().min(1, 'Enter a name').max(80, 'Use at most 80 characters');

export const UNIT_SYSTEMS = ['us', 'metric'] as const;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

function isTimeZone(value: string): boolean {
  try {
    new Intl.DateTimeFormat('en-US', { timeZone: value });
    return true;
  } catch {
    return false;
  }
}

export const timeZone = z.string().max(64).refine(isTimeZone, 'Choose a valid time zone');

export const signInSchema = z.strictObject({
  email,
  password: z.string().min(1, 'Enter your password').max(PASSWORD_MAX),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const signUpSchema = z.strictObject({
  breweryName: z.string().trim().min(2, 'Enter the brewery name').max(120),
  displayName,
  email,
  password,
  unitSystem: z.enum(UNIT_SYSTEMS),
  timeZone,
});
export type SignUpInput = z.infer<typeof signUpSchema>;

export const changePasswordSchema = z.strictObject({
  currentPassword: z.string().min(1, 'Enter your current password').max(PASSWORD_MAX),
  newPassword: password,
});
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>;

export const resetRequestSchema = z.strictObject({ email });
export type ResetRequestInput = z.infer<typeof resetRequestSchema>;

export const tokenParam = z.string().regex(/^[A-Za-z0-9_-]{20,100}$/, 'This link is not valid');

export const acceptInviteSchema = z.strictObject({ displayName, password });
export type AcceptInviteInput = z.infer<typeof acceptInviteSchema>;

export const resetPasswordSchema = z.strictObject({ password });
export type ResetPasswordInput = z.infer<typeof resetPasswordSchema>;

export const inviteSchema = z.strictObject({
  email,
  role: z.enum(ROLES),
});
export type InviteInput = z.infer<typeof inviteSchema>;

export const updateMemberSchema = z
  .strictObject({
    role: z.enum(ROLES).optional(),
    disabled: z.boolean().optional(),
  })
  .refine((v) => v.role !== undefined || v.disabled !== undefined, 'Change the role or the access');
export type UpdateMemberInput = z.infer<typeof updateMemberSchema>;

export const brewerySettingsSchema = z.strictObject({
  name: z.string().trim().min(2, 'Enter the brewery name').max(120),
  unitSystem: z.enum(UNIT_SYSTEMS),
  timeZone,
});
export type BrewerySettingsInput = z.infer<typeof brewerySettingsSchema>;

/** What the API answers for the signed-in person. */
export interface Me {
  id: number;
  email: string;
  displayName: string;
  role: (typeof ROLES)[number];
  brewery: { id: number; name: string; unitSystem: UnitSystem; timeZone: string };
}

export const idParam = z.coerce.number().int().positive().max(2_147_483_647);
