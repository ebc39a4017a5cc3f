import { z } from 'zod';
import { studioRoleSchema } from './auth';

export const memberSchema = z.object({
  userId: z.string(),
  name: z.string(),
  email: z.string(),
  role: studioRoleSchema,
  joinedAt: z.string(),
});
export type Member = z.infer<typeof memberSchema>;

export const pendingInvitationSchema = z.object({
  id: z.string(),
  email: z.string(),
  role: studioRoleSchema,
  invitedBy: z.string(),
  createdAt: z.string(),
  expiresAt: z.string(),
});
export type PendingInvitation = z.infer<typeof pendingInvitationSchema>;

export const membersResponseSchema = z.object({
  members: z.array(memberSchema),
  invitations: z.array(pendingInvitationSchema),
});
export type MembersResponse = z.infer<typeof membersResponseSchema>;

// Owners are made by sign-up; invitations bring editors and reviewers.
export const createInvitationRequestSchema = z.object({
  email: z.string().trim().toLowerCase().email('Enter a valid e-mail address').max(254),
  role: z.enum(['editor', 'reviewer']),
});

export const updateMemberRequestSchema = z.object({ role: studioRoleSchema });

export const studioSettingsSchema = z.object({
  id: z.string(),
  name: z.string(),
  paletteLimit: z.number().int(),
  readyWeeksBeforeLaunch: z.number().int(),
  createdAt: z.string(),
});
export type StudioSettings = z.infer<typeof studioSettingsSchema>;

export const updateStudioRequestSchema = z
  .object({
    name: z.string().trim().min(1).max(120),
    // 6 colour groups: a common screen/print palette limit (common practice).
    paletteLimit: z.number().int().min(1).max(64),
    readyWeeksBeforeLaunch: z.number().int().min(0).max(52),
  })
  .partial();

export const healthResponseSchema = z.object({
  status: z.enum(['ok', 'degraded']),
  services: z.object({
    database: z.enum(['up', 'down']),
    storage: z.enum(['up', 'down']),
    mail: z.enum(['up', 'down']),
  }),
});
