import type { FormEvent } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { signInRequestSchema } from '@shared/contracts/auth';
import { Button } from '../../../components/ui/button';
import { StatusMessage } from '../../../components/ui/status-message';
import { TextField } from '../../../components/ui/text-field';
import { checkForm, formValues } from '../../../lib/form-errors';
import { safeReturnPath } from '../../../lib/return-path';
import { useFormErrors } from '../../../lib/use-form-errors';
import { useSignIn } from '../api/sign-in';
import { AuthPanel, textLinkClasses } from '../components/auth-panel';

export function SignInPage() {
  const [params] = useSearchParams();
  const returnTo = safeReturnPath(params.get('returnTo'));
  const navigate = useNavigate();
  const { formRef, fieldErrors, formMessage, showErrors, showRequestError, clearErrors } = useFormErrors();
  const signIn = useSignIn({
    mutationConfig: { onSuccess: () => navigate(returnTo, { replace: true }), onError: showRequestError },
  });

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const check = checkForm(signInRequestSchema, formValues(event.currentTarget));
    if (!check.ok) return showErrors(check.fields);
    clearErrors();
    signIn.mutate(check.data);
  };

  const signUpLink = returnTo === '/' ? '/sign-up' : `/sign-up?returnTo=${encodeURIComponent(returnTo)}`;

  return (
    <AuthPanel
      title="Sign in"
      description="Welcome back. Sign in to open your studio."
      footer={
        <>
          New to Motifold?{' '}
          <Link to={signUpLink} className={textLinkClasses}>
            Set up a studio
          </Link>
        </>
      }
    >
      <form ref={formRef} noValidate onSubmit={submit} className="flex flex-col gap-5">
        {formMessage && (
          <StatusMessage tone="problem" formMessage>
            {formMessage}
          </StatusMessage>
        )}
        <TextField label="E-mail address" name="email" type="email" autoComplete="email" error={fieldErrors.email} />
        <TextField
          label="Password"
          name="password"
          type="password"
          autoComplete="current-password"
          error={fieldErrors.password}
        />
        <div className="flex flex-wrap items-center justify-between gap-3">
          <Button type="submit" busy={signIn.isPending} busyLabel="Signing in…">
            Sign in
          </Button>
          <Link to="/forgot-password" className={textLinkClasses}>
            Forgot your password?
          </Link>
        </div>
      </form>
    </AuthPanel>
  );
}
