import { z } from 'zod';
import { ROLES } from '../auth/permissions';

/** API contracts for sign-in, sessions, invitations, password resets and team membership. */
export const roleSchema = z.enum(ROLES);

export const emailSchema = z.string().trim().toLowerCase().email('must be a valid e-mail address').max(254);
export const passwordSchema = z.string().min(10, 'must be at least 10 characters').max(200, 'must be at most 200 characters');

export const signInBody = z.object({
  email: emailSchema,
  password: z.string().min(1, 'is required').max(200),
});
export type SignInBody = z.infer<typeof signInBody>;

export const membershipSchema = z.object({
  teamId: z.string().uuid(),
  teamName: z.string(),
  role: roleSchema,
});
export type Membership = z.infer<typeof membershipSchema>;

export const userSchema = z.object({
  id: z.string().uuid(),
  email: z.string(),
  name: z.string(),
});
export type User = z.infer<typeof userSchema>;

export const sessionSchema = z.object({
  user: userSchema,
  memberships: z.array(membershipSchema),
});
export type Session = z.infer<typeof sessionSchema>;

export const inviteBody = z.object({
  email: emailSchema,
  name: z.string().trim().min(1, 'is required').max(120),
  role: roleSchema,
});
export type InviteBody = z.infer<typeof inviteBody>;

export const acceptTokenBody = z.object({
  token: z.string().min(20, 'is not a valid link token').max(200),
  password: passwordSchema,
});
export type AcceptTokenBody = z.infer<typeof acceptTokenBody>;

export const resetRequestBody = z.object({ email: emailSchema });
export type ResetRequestBody = z.infer<typeof resetRequestBody>;

export const memberSchema = z.object({
  userId: z.string().uuid(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
  joinedAt: z.string(),
});
export type Member = z.infer<typeof memberSchema>;

export const changeRoleBody = z.object({ role: roleSchema });

export const outboxMessageSchema = z.object({
  id: z.string().uuid(),
  from: z.string(),
  to: z.string(),
  subject: z.string(),
  text: z.string(),
  receivedAt: z.string(),
});
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;

/** Every error reply from the API has this shape. */
export const apiErrorSchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    details: z.unknown().optional(),
  }),
});
export type ApiError = z.infer<typeof apiErrorSchema>;

/** An invitation still waiting for its person (not accepted, not expired), as team admins see it. */
export const pendingInvitationSchema = z.object({
  id: z.string().uuid(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
  /** Name of the admin who sent it; null when that account is gone. */
  invitedBy: z.string().nullable(),
  createdAt: z.string(),
  expiresAt: z.string(),
});
export type PendingInvitation = z.infer<typeof pendingInvitationSchema>;

/** What an invitation link says about itself when opened: no more than the invitation mail did. */
export const invitationCheckSchema = z.object({
  email: z.string(),
  teamName: z.string(),
  /** The address has an account already: its owner confirms with the current password. */
  existingAccount: z.boolean(),
});
export type InvitationCheck = z.infer<typeof invitationCheckSchema>;

/** A reset link that can still be used, when opened. */
export const resetCheckSchema = z.object({ expiresAt: z.string() });
export type ResetCheck = z.infer<typeof resetCheckSchema>;

/** Harmless facts the sign-in pages need before anyone signs in. */
export const authOptionsSchema = z.object({
  /** Mail goes to the local mail fake on this machine, not out (no SMTP_HOST of a real server). */
  mailFake: z.boolean(),
  resetLinkMinutes: z.number().int().positive(),
  invitationDays: z.number().int().positive(),
});
export type AuthOptions = z.infer<typeof authOptionsSchema>;
