import { Page } from '@/components/ui/page';
import { SignUpForm } from '@/features/auth/components/sign-up-form';

/** Create an account. */
export function SignUpRoute() {
  return (
    <Page
      title="Join"
      width="narrow"
      intro={<p>Create your account; we'll send a link to confirm your e-mail address.</p>}
    >
      <SignUpForm />
    </Page>
  );
}
