import { useState, type FormEvent } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { passwordResetConfirmSchema } from '@shared/contracts/auth';
import { Button, ButtonLink } from '../../../components/ui/button';
import { StatusMessage } from '../../../components/ui/status-message';
import { TextField } from '../../../components/ui/text-field';
import { isApiRequestError } from '../../../lib/api-client';
import { checkForm, formValues } from '../../../lib/form-errors';
import { useFormErrors } from '../../../lib/use-form-errors';
import { useConfirmPasswordReset } from '../api/confirm-password-reset';
import { AuthPanel, textLinkClasses } from '../components/auth-panel';
import { useFocusHeadingWhen } from '../components/use-focus-heading';

const brokenLink = 'This reset link is incomplete. Open it again from the e-mail, or ask for a new one.';
const linkProblems = new Set(['reset.invalid_token', 'reset.expired', 'reset.used']);

export function ResetConfirmPage() {
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const [done, setDone] = useState(false);
  // The server's message when the link itself is spent (used, expired, unknown).
  const [linkProblem, setLinkProblem] = useState<string | null>(null);
  const { formRef, fieldErrors, formMessage, showErrors, showRequestError, clearErrors } = useFormErrors();
  const confirmReset = useConfirmPasswordReset({
    mutationConfig: {
      onSuccess: () => setDone(true),
      onError: (error) => {
        if (isApiRequestError(error) && linkProblems.has(error.code)) setLinkProblem(error.message);
        else showRequestError(error);
      },
    },
  });
  useFocusHeadingWhen(done || linkProblem);

  const askAgain = (
    <Link to="/forgot-password" className={textLinkClasses}>
      Ask for a new link
    </Link>
  );

  if (done) {
    return (
      <AuthPanel title="Your password is changed" description="Sign in with your new password.">
        <ButtonLink to="/sign-in">Sign in</ButtonLink>
      </AuthPanel>
    );
  }

  if (!token || linkProblem) {
    return (
      <AuthPanel title="This link cannot be used">
        <div className="flex flex-col gap-4">
          <StatusMessage tone="problem">{linkProblem ?? brokenLink}</StatusMessage>
          <div>
            <ButtonLink to="/forgot-password">Ask for a new link</ButtonLink>
          </div>
        </div>
      </AuthPanel>
    );
  }

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const values = formValues(event.currentTarget);
    const check = checkForm(passwordResetConfirmSchema, { token, password: values.password });
    if (!check.ok) {
      const { token: tokenProblem, ...fields } = check.fields;
      if (tokenProblem) return setLinkProblem(brokenLink);
      if (values.password && values.password !== values.repeatPassword) fields.repeatPassword = 'The two passwords are different';
      return showErrors(fields);
    }
    if (values.password !== values.repeatPassword) return showErrors({ repeatPassword: 'The two passwords are different' });
    clearErrors();
    confirmReset.mutate(check.data);
  };

  return (
    <AuthPanel title="Choose a new password" description="Pick a password you do not use anywhere else." footer={askAgain}>
      <form ref={formRef} noValidate onSubmit={submit} className="flex flex-col gap-5">
        {formMessage && (
          <StatusMessage tone="problem" formMessage>
            {formMessage}
          </StatusMessage>
        )}
        <TextField
          label="New password"
          name="password"
          type="password"
          autoComplete="new-password"
          hint="At least 10 characters."
          error={fieldErrors.password}
        />
        <TextField
          label="New password again"
          name="repeatPassword"
          type="password"
          autoComplete="new-password"
          error={fieldErrors.repeatPassword}
        />
        <div>
          <Button type="submit" busy={confirmReset.isPending} busyLabel="Saving…">
            Save new password
          </Button>
        </div>
      </form>
    </AuthPanel>
  );
}
