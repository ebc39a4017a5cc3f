import type { FormEvent } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { signUpRequestSchema } from '@shared/contracts/auth';
import { Button } from '../../../components/ui/button';
import { StatusMessage } from '../../../components/ui/status-message';
import { TextField } from '../../../components/ui/text-field';
import { checkForm, formValues } from '../../../lib/form-errors';
import { safeReturnPath, signInPath } from '../../../lib/return-path';
import { useFormErrors } from '../../../lib/use-form-errors';
import { useSignUp } from '../api/sign-up';
import { AuthPanel, textLinkClasses } from '../components/auth-panel';

export function SignUpPage() {
  const [params] = useSearchParams();
  const returnTo = safeReturnPath(params.get('returnTo'));
  const navigate = useNavigate();
  const { formRef, fieldErrors, formMessage, showErrors, showRequestError, clearErrors } = useFormErrors();
  const signUp = useSignUp({
    mutationConfig: { onSuccess: () => navigate(returnTo, { replace: true }), onError: showRequestError },
  });

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const check = checkForm(signUpRequestSchema, formValues(event.currentTarget));
    if (!check.ok) return showErrors(check.fields);
    clearErrors();
    signUp.mutate(check.data);
  };

  return (
    <AuthPanel
      title="Set up your studio"
      description="A studio holds your originals, motifs and products. You will be its owner and can invite others later."
      footer={
        <>
          Already have an account?{' '}
          <Link to={signInPath(returnTo)} className={textLinkClasses}>
            Sign in
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
        <TextField label="Your name" name="name" autoComplete="name" error={fieldErrors.name} />
        <TextField label="E-mail address" name="email" type="email" autoComplete="email" error={fieldErrors.email} />
        <TextField
          label="Password"
          name="password"
          type="password"
          autoComplete="new-password"
          hint="At least 10 characters. A short sentence is easy to remember and hard to guess."
          error={fieldErrors.password}
        />
        <TextField
          label="Studio name"
          name="studioName"
          autoComplete="organization"
          hint="You can change it later in Settings."
          error={fieldErrors.studioName}
        />
        <div>
          <Button type="submit" busy={signUp.isPending} busyLabel="Setting up…">
            Create studio
          </Button>
        </div>
      </form>
    </AuthPanel>
  );
}
