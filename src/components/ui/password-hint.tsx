import { PASSWORD_MAX, PASSWORD_MIN } from '../../../shared/schemas/auth';

export function PasswordHint() {
  return (
    <>
      {PASSWORD_MIN} to {PASSWORD_MAX} characters. A few unrelated words make a strong one; common passwords are
      refused.
    </>
  );
}
