import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link, useSearchParams } from 'react-router';
import { PASSWORD_MIN, resetPasswordSchema, type ResetPasswordInput } from '../../../../shared/accounts';
import { paths } from '../../../paths';
import { TextField } from '../../../components/ui/field';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { useResetPassword } from '../api';
import { passwordErrorMessage } from '../auth-errors';
import { AuthPanel } from './auth-panel';

/** The e-mailed link lands here as /reset-password?token=… (or ?error=… when the token is stale). */
export function ResetPasswordForm() {
  const [params] = useSearchParams();
  const token = params.get('token');
  const reset = useResetPassword();
  const { register, handleSubmit, formState: { errors } } = useForm<ResetPasswordInput>({ resolver: zodResolver(resetPasswordSchema) });
  const askAgain = <Link className="text-accent underline" to={paths.forgotPassword()}>Ask for a new link</Link>;

  if (!token || params.get('error')) {
    return (
      <AuthPanel title="Choose a new password" footer={askAgain}>
        <Notice tone="caution" role="alert">This link has expired or was already used. Reset links work once, for one hour.</Notice>
      </AuthPanel>
    );
  }
  if (reset.isSuccess) {
    return (
      <AuthPanel title="Password changed">
        <Notice tone="success" role="status">
          Your new password is set and other devices were signed out. <Link className="text-accent underline" to={paths.signIn()}>Sign in</Link> with it now.
        </Notice>
      </AuthPanel>
    );
  }
  return (
    <AuthPanel title="Choose a new password" footer={askAgain}>
      <form noValidate onSubmit={handleSubmit(({ newPassword }) => reset.mutate({ token, newPassword }))} className="flex flex-col gap-4">
        {reset.isError && <Notice tone="danger" role="alert">{passwordErrorMessage(reset.error)}</Notice>}
        <TextField label="New password" type="password" autoComplete="new-password" hint={`At least ${PASSWORD_MIN} characters.`} error={errors.newPassword?.message} {...register('newPassword')} />
        <TextField label="New password again" type="password" autoComplete="new-password" error={errors.confirmPassword?.message} {...register('confirmPassword')} />
        <Button type="submit" disabled={reset.isPending}>{reset.isPending ? 'Saving…' : 'Save the new password'}</Button>
      </form>
    </AuthPanel>
  );
}
