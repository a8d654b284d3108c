import { Link } from 'react-router-dom';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { paths } from '@/config/paths';
import { useSignup } from '../api/signup';
import { lazyResolver } from '@/lib/lazy-schema';
import { useAccountForm } from '../hooks/use-account-form';

const resolver = lazyResolver((schemas) => schemas.signupSchema);
import { AccountForm, EmailField, PasswordField } from './account-form';

const FIELDS = ['email', 'password', 'displayName'] as const;

/** Creates an account; on success it asks the person to confirm the address from their inbox. */
export function SignUpForm() {
  const signup = useSignup();
  const { register, errors, frame } = useAccountForm({
    resolver,
    defaultValues: { email: '', password: '', displayName: '' },
    fields: FIELDS,
    send: (input) => signup.mutateAsync(input),
  });

  if (signup.isSuccess) {
    return (
      <Alert tone="success" title="Check your inbox">
        <p>
          We sent a confirmation link to {signup.data.email}. Open it to finish joining, then{' '}
          <Link to={paths.signIn.href()}>sign in</Link>.
        </p>
      </Alert>
    );
  }

  return (
    <AccountForm {...frame}>
      <TextField
        label="Your name"
        hint="Shown to other members on posts and listings."
        autoComplete="name"
        required
        error={errors.displayName?.message}
        {...register('displayName')}
      />
      <EmailField error={errors.email?.message} {...register('email')} />
      <PasswordField
        label="Password"
        isNew
        hint="At least 10 characters. A few unrelated words make a strong one."
        error={errors.password?.message}
        {...register('password')}
      />
      <Button type="submit" isPending={signup.isPending} pendingLabel="Creating your account…">
        Create account
      </Button>
      <p className="text-sm">
        Already a member? <Link to={paths.signIn.href()}>Sign in</Link>
      </p>
    </AccountForm>
  );
}
