import { ForgotPasswordForm } from '../features/session/components/forgot-password-form';

export function Component() {
  return <ForgotPasswordForm />;
}
