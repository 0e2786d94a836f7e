import { PASSWORD_MIN } from '@/shared/schemas/auth';

/** The rule for a new password, said beside every field that sets one. */
export const newPasswordHint = `At least ${PASSWORD_MIN} characters. Very common passwords are refused; a few unrelated words make a strong one.`;
