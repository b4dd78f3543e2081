import { ResetPasswordForm } from '../features/session/components/reset-password-form';

export function Component() {
  return <ResetPasswordForm />;
}
