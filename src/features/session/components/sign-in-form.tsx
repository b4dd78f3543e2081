import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { Link, useNavigate, useSearchParams } from 'react-router';
import { signInSchema, safeNextPath, type SignInInput } from '../../../../shared/accounts';
import { paths } from '../../../paths';
import { TextField } from '../../../components/ui/field';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { useSignIn } from '../api';
import { signInErrorMessage } from '../auth-errors';
import { AuthPanel } from './auth-panel';

export function SignInForm() {
  const [params] = useSearchParams();
  const next = safeNextPath(params.get('next'), paths.catalogue());
  const navigate = useNavigate();
  const signIn = useSignIn();
  const { register, handleSubmit, formState: { errors } } = useForm<SignInInput>({ resolver: zodResolver(signInSchema) });

  const onSubmit = handleSubmit((values) =>
    signIn.mutate(values, { onSuccess: () => navigate(next, { replace: true }) }));

  return (
    <AuthPanel
      title="Sign in"
      intro="Sign in to hold slabs, pay and book a pickup."
      footer={<>
        <Link className="text-accent underline" to={paths.forgotPassword()}>Forgot your password?</Link>
        <span>New here? <Link className="text-accent underline" to={paths.signUp(params.get('next') ? next : undefined)}>Open an account</Link></span>
      </>}
    >
      <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
        {signIn.isError && <Notice tone="danger" role="alert">{signInErrorMessage(signIn.error)}</Notice>}
        <TextField label="E-mail" type="email" autoComplete="email" inputMode="email" error={errors.email?.message} {...register('email')} />
        <TextField label="Password" type="password" autoComplete="current-password" error={errors.password?.message} {...register('password')} />
        <Button type="submit" disabled={signIn.isPending}>{signIn.isPending ? 'Signing in…' : 'Sign in'}</Button>
      </form>
    </AuthPanel>
  );
}
