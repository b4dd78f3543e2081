import { SignInForm } from '../features/session/components/sign-in-form';

export { signedOutOnlyLoader as loader } from './signed-out-only';

export function Component() {
  return <SignInForm />;
}
