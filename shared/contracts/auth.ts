import { z } from 'zod';
import { studioRoles } from '../auth/permissions';

export const studioRoleSchema = z.enum(studioRoles);

const email = z.string().trim().toLowerCase().email('Enter a valid e-mail address').max(254);
// 10 characters: long enough to resist guessing, short enough for a passphrase (common practice).
const newPassword = z
  .string()
  .min(10, 'Use at least 10 characters')
  .max(200, 'Use at most 200 characters');
const personName = z.string().trim().min(1, 'Enter your name').max(120);

export const csrfResponseSchema = z.object({ csrfToken: z.string() });

export const signUpRequestSchema = z.object({
  name: personName,
  email,
  password: newPassword,
  studioName: z.string().trim().min(1, 'Name your studio').max(120),
});
export type SignUpRequest = z.infer<typeof signUpRequestSchema>;

export const signInRequestSchema = z.object({
  email,
  password: z.string().min(1, 'Enter your password').max(200),
});
export type SignInRequest = z.infer<typeof signInRequestSchema>;

export const userSchema = z.object({ id: z.string(), name: z.string(), email: z.string() });
export const studioSummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  role: studioRoleSchema,
});

export const meResponseSchema = z.object({
  user: userSchema,
  studio: studioSummarySchema.nullable(),
  role: studioRoleSchema.nullable(),
  studios: z.array(studioSummarySchema),
});
export type MeResponse = z.infer<typeof meResponseSchema>;

export const switchStudioRequestSchema = z.object({ studioId: z.string().uuid() });

export const passwordResetRequestSchema = z.object({ email });
export const passwordResetConfirmSchema = z.object({
  token: z.string().min(20).max(200),
  password: newPassword,
});

export const invitationPreviewSchema = z.object({
  studioName: z.string(),
  email: z.string(),
  role: studioRoleSchema,
  invitedBy: z.string(),
  accountExists: z.boolean(),
  expiresAt: z.string(),
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;

// A new account gives name + password; an existing account gives its password
// (or is already signed in as the invited address).
export const acceptInvitationRequestSchema = z.object({
  name: personName.optional(),
  password: z.string().min(1).max(200).optional(),
});
