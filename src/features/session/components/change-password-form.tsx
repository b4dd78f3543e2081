import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { changePasswordSchema, PASSWORD_MIN, type ChangePasswordInput } from '../../../../shared/accounts';
import { TextField } from '../../../components/ui/field';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { useChangePassword } from '../api';
import { isWrongCurrentPassword, passwordErrorMessage } from '../auth-errors';

export function ChangePasswordForm() {
  const change = useChangePassword();
  const { register, handleSubmit, setError, reset, formState: { errors } } = useForm<ChangePasswordInput>({ resolver: zodResolver(changePasswordSchema) });

  const onSubmit = handleSubmit((values) =>
    change.mutate(values, {
      onSuccess: () => reset(),
      onError: (error) => {
        if (isWrongCurrentPassword(error)) setError('currentPassword', { message: 'That is not your current password' });
      },
    }));

  return (
    <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4" aria-labelledby="change-password-heading">
      <h2 id="change-password-heading" className="font-display text-lg font-bold">Change password</h2>
      {change.isSuccess && <Notice tone="success" role="status">Password changed. Other devices were signed out.</Notice>}
      {change.isError && !isWrongCurrentPassword(change.error) && <Notice tone="danger" role="alert">{passwordErrorMessage(change.error)}</Notice>}
      <TextField label="Current password" type="password" autoComplete="current-password" error={errors.currentPassword?.message} {...register('currentPassword')} />
      <TextField label="New password" type="password" autoComplete="new-password" hint={`At least ${PASSWORD_MIN} characters.`} error={errors.newPassword?.message} {...register('newPassword')} />
      <TextField label="New password again" type="password" autoComplete="new-password" error={errors.confirmPassword?.message} {...register('confirmPassword')} />
      <Button type="submit" variant="secondary" disabled={change.isPending}>{change.isPending ? 'Saving…' : 'Save new password'}</Button>
    </form>
  );
}
