import { z } from 'zod';

export const emailSchema = z
  .string({ error: 'E-mail is required' })
  .trim()
  .toLowerCase()
  .max(254, 'E-mail is too long')
  .pipe(z.email({ error: 'Enter a valid e-mail address' }));

export const passwordSchema = z
  .string({ error: 'Password is required' })
  .min(10, 'Use at least 10 characters')
  .max(200, 'Use at most 200 characters');

export const displayNameSchema = z
  .string({ error: 'Name is required' })
  .trim()
  .min(1, 'Name is required')
  .max(80, 'Use at most 80 characters');

export const registerSchema = z.strictObject({
  email: emailSchema,
  name: displayNameSchema,
  password: passwordSchema,
});
export type RegisterInput = z.infer<typeof registerSchema>;

export const signInSchema = z.strictObject({
  email: emailSchema,
  password: z.string({ error: 'Password is required' }).min(1, 'Password is required').max(200),
});
export type SignInInput = z.infer<typeof signInSchema>;

export interface UserView {
  id: string;
  email: string;
  name: string;
  createdAt: string;
}

/** Answer of register, sign-in and refresh. The refresh token travels only in an httpOnly cookie. */
export interface SessionView {
  user: UserView;
  accessToken: string;
  /** ISO time at which the access token stops working; clients refresh shortly before. */
  accessTokenExpiresAt: string;
}

export interface DemoAccount {
  email: string;
  password: string;
  name: string;
  role: string;
}
