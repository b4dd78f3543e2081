import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { changeEmailSchema, updateNameSchema, type ChangeEmailInput, type UpdateNameInput } from '../../../../shared/accounts';
import { TextField } from '../../../components/ui/field';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { ApiError, friendlyMessage } from '../../../lib/api-client';
import { useChangeEmail, useUpdateName } from '../api';

/** Field messages from the server land at their field; anything else shows above the form. */
function serverFieldError<T extends string>(error: unknown, field: T) {
  return error instanceof ApiError ? error.fieldErrors[field]?.[0] : undefined;
}

export function ChangeNameForm({ name }: { name: string }) {
  const change = useUpdateName();
  const { register, handleSubmit, formState: { errors } } = useForm<UpdateNameInput>({ resolver: zodResolver(updateNameSchema), defaultValues: { name } });
  const fieldError = errors.name?.message ?? serverFieldError(change.error, 'name');
  return (
    <form noValidate onSubmit={handleSubmit((v) => change.mutate(v))} className="flex flex-col gap-4" aria-labelledby="change-name-heading">
      <h2 id="change-name-heading" className="font-display text-lg font-bold">Your name</h2>
      {change.isSuccess && <Notice tone="success" role="status">Name saved.</Notice>}
      {change.isError && !fieldError && <Notice tone="danger" role="alert">{friendlyMessage(change.error)}</Notice>}
      <TextField label="Name" autoComplete="name" hint="Shown on your orders and in e-mails from the mill." error={fieldError} {...register('name')} />
      <div><Button type="submit" variant="secondary" disabled={change.isPending}>{change.isPending ? 'Saving…' : 'Save name'}</Button></div>
    </form>
  );
}

export function ChangeEmailForm({ email }: { email: string }) {
  const change = useChangeEmail();
  const { register, handleSubmit, getValues, formState: { errors } } = useForm<ChangeEmailInput>({ resolver: zodResolver(changeEmailSchema) });
  const fieldError = errors.newEmail?.message ?? serverFieldError(change.error, 'newEmail');
  const sameAsNow = change.error instanceof ApiError && /same/i.test(change.error.message);
  return (
    <form noValidate onSubmit={handleSubmit((v) => change.mutate(v))} className="flex flex-col gap-4" aria-labelledby="change-email-heading">
      <h2 id="change-email-heading" className="font-display text-lg font-bold">Change e-mail</h2>
      <p className="text-sm text-ink-soft">Now: <span className="break-all">{email}</span>. We send a link to the new address; the change counts once you open it.</p>
      {change.isSuccess && (
        <Notice tone="success" role="status">Check the inbox of {getValues('newEmail')} and open the link we sent. Until then, sign in with {email}.</Notice>
      )}
      {change.isError && !fieldError && (
        <Notice tone="danger" role="alert">{sameAsNow ? 'That is already your e-mail.' : friendlyMessage(change.error)}</Notice>
      )}
      <TextField label="New e-mail" type="email" autoComplete="email" error={fieldError} {...register('newEmail')} />
      <div><Button type="submit" variant="secondary" disabled={change.isPending}>{change.isPending ? 'Sending…' : 'Send confirmation link'}</Button></div>
    </form>
  );
}
