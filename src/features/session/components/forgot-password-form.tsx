import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link } from 'react-router';
import { forgotPasswordSchema, RESET_REQUESTED_MESSAGE, type ForgotPasswordInput } from '../../../../shared/accounts';
import { paths } from '../../../paths';
import { TextField } from '../../../components/ui/field';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { useRequestPasswordReset } from '../api';
import { passwordErrorMessage } from '../auth-errors';
import { AuthPanel } from './auth-panel';

/** Always the same answer, so the page cannot be used to find out who has an account. */
export function ForgotPasswordForm() {
  const request = useRequestPasswordReset();
  const { register, handleSubmit, formState: { errors } } = useForm<ForgotPasswordInput>({ resolver: zodResolver(forgotPasswordSchema) });

  return (
    <AuthPanel
      title="Forgot your password?"
      intro="Enter the e-mail you signed up with and we will send a link to choose a new password. The link works for one hour."
      footer={<Link className="text-accent underline" to={paths.signIn()}>Back to sign in</Link>}
    >
      {request.isSuccess ? (
        <Notice tone="success" role="status">{RESET_REQUESTED_MESSAGE} Check your spam folder if nothing arrives in a few minutes.</Notice>
      ) : (
        <form noValidate onSubmit={handleSubmit((v) => request.mutate(v))} className="flex flex-col gap-4">
          {request.isError && <Notice tone="danger" role="alert">{passwordErrorMessage(request.error)}</Notice>}
          <TextField label="E-mail" type="email" autoComplete="email" inputMode="email" error={errors.email?.message} {...register('email')} />
          <Button type="submit" disabled={request.isPending}>{request.isPending ? 'Sending…' : 'Send the link'}</Button>
        </form>
      )}
    </AuthPanel>
  );
}
