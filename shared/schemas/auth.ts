import { z } from 'zod';

export const roles = ['buyer', 'seller', 'admin'] as const;
export type Role = (typeof roles)[number];

export const emailSchema = z.string().trim().toLowerCase().email('Enter a valid e-mail address').max(254);
export const passwordSchema = z
  .string()
  .min(10, 'Use at least 10 characters')
  .max(200, 'Use at most 200 characters');

export const registerInput = z.object({
  email: emailSchema,
  password: passwordSchema,
  displayName: z.string().trim().min(2, 'Enter at least 2 characters').max(80),
});
export type RegisterInput = z.infer<typeof registerInput>;

export const loginInput = z.object({
  email: emailSchema,
  password: z.string().min(1, 'Enter your password').max(200),
});
export type LoginInput = z.infer<typeof loginInput>;

export const verifyEmailInput = z.object({ token: z.string().min(16).max(200) });
export const forgotPasswordInput = z.object({ email: emailSchema });
export const resetPasswordInput = z.object({ token: z.string().min(16).max(200), password: passwordSchema });

export const userSchema = z.object({
  id: z.string(),
  email: z.string(),
  displayName: z.string(),
  roles: z.array(z.enum(roles)),
  emailVerified: z.boolean(),
});
export type User = z.infer<typeof userSchema>;
export const userReply = z.object({ user: userSchema });

export const sellerApplicationInput = z.object({
  businessName: z.string().trim().min(2).max(120),
  location: z.string().trim().min(2).max(120),
  whatTheySell: z.string().trim().min(10, 'Tell us in at least 10 characters').max(2000),
});
export type SellerApplicationInput = z.infer<typeof sellerApplicationInput>;

export const sellerApplicationStates = ['pending', 'approved', 'rejected'] as const;
export const sellerApplicationSchema = z.object({
  id: z.string(),
  userId: z.string(),
  userEmail: z.string().optional(),
  businessName: z.string(),
  location: z.string(),
  whatTheySell: z.string(),
  state: z.enum(sellerApplicationStates),
  decisionNote: z.string().nullable(),
  createdAt: z.string(),
});
export type SellerApplication = z.infer<typeof sellerApplicationSchema>;

export const sellerApplicationDecisionInput = z.object({
  decision: z.enum(['approve', 'reject']),
  note: z.string().trim().max(1000).optional(),
});
