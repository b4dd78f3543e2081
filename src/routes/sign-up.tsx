import { SignUpForm } from '../features/session/components/sign-up-form';

export { signedOutOnlyLoader as loader } from './signed-out-only';

export function Component() {
  return <SignUpForm />;
}
