import { z } from 'zod';

/** The server's better-auth setting (minPasswordLength); checked here to answer at once. */
export const PASSWORD_MIN_LENGTH = 10;

const emailSchema = z.string().trim().toLowerCase().pipe(z.email());
const newPasswordSchema = z.string().min(PASSWORD_MIN_LENGTH).max(128);

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, 'Enter your password.'),
});

export const signUpSchema = z.object({
  name: z.string().trim().min(1).max(80),
  email: emailSchema,
  password: newPasswordSchema,
});

export const addressSchema = z.object({ email: emailSchema });

export const setPasswordSchema = z
  .object({ newPassword: newPasswordSchema, repeatPassword: z.string() })
  .refine((v) => v.newPassword === v.repeatPassword, {
    message: 'The two passwords differ.',
    path: ['repeatPassword'],
  });

export const deleteAccountSchema = z.object({
  password: z.string().min(1, 'Enter your password to confirm.'),
});
