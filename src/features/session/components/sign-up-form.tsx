import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link, useNavigate, useSearchParams } from 'react-router';
import { PASSWORD_MIN, signUpSchema, safeNextPath, type SignUpInput } from '../../../../shared/accounts';
import { paths } from '../../../paths';
import { TextField } from '../../../components/ui/field';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { ApiError } from '../../../lib/api-client';
import { useSignUp } from '../api';
import { signUpErrorMessage } from '../auth-errors';
import { AuthPanel } from './auth-panel';

export function SignUpForm() {
  const [params] = useSearchParams();
  const next = safeNextPath(params.get('next'), paths.catalogue());
  const navigate = useNavigate();
  const signUp = useSignUp();
  const { register, handleSubmit, setError, formState: { errors } } = useForm<SignUpInput>({ resolver: zodResolver(signUpSchema) });

  const onSubmit = handleSubmit((values) =>
    signUp.mutate(values, {
      onSuccess: () => navigate(next, { replace: true }),
      onError: (error) => {
        if (error instanceof ApiError) {
          for (const [field, messages] of Object.entries(error.fieldErrors)) {
            if (field === 'name' || field === 'email' || field === 'password') setError(field, { message: messages[0] });
          }
        }
      },
    }));

  return (
    <AuthPanel
      title="Open an account"
      intro="An account lets you hold a slab while you decide, pay online and book a pickup time at the yard."
      footer={<span>Already have an account? <Link className="text-accent underline" to={paths.signIn(params.get('next') ? next : undefined)}>Sign in</Link></span>}
    >
      <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
        {signUp.isError && <Notice tone="danger" role="alert">{signUpErrorMessage(signUp.error)}</Notice>}
        <TextField label="Your name" autoComplete="name" error={errors.name?.message} {...register('name')} />
        <TextField label="E-mail" type="email" autoComplete="email" inputMode="email" error={errors.email?.message} {...register('email')} />
        <TextField
          label="Password"
          type="password"
          autoComplete="new-password"
          hint={`At least ${PASSWORD_MIN} characters. A few unrelated words make a strong one.`}
          error={errors.password?.message}
          {...register('password')}
        />
        <Button type="submit" disabled={signUp.isPending}>{signUp.isPending ? 'Opening…' : 'Open my account'}</Button>
      </form>
    </AuthPanel>
  );
}
