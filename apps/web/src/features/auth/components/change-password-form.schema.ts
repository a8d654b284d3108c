import { changePasswordSchema, z } from '../../../lib/schemas';

/** The password change with the new password typed twice (loaded lazily with zod). */
export const changePasswordFormSchema = changePasswordSchema
  .extend({ confirmNewPassword: z.string() })
  .refine((values) => values.newPassword === values.confirmNewPassword, {
    path: ['confirmNewPassword'],
    message: "The two new passwords don't match",
  });
