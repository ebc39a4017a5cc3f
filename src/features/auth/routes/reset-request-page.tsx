import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { passwordResetRequestSchema } from '@shared/contracts/auth';
import { Button } from '../../../components/ui/button';
import { StatusMessage } from '../../../components/ui/status-message';
import { TextField } from '../../../components/ui/text-field';
import { checkForm, formValues } from '../../../lib/form-errors';
import { useFormErrors } from '../../../lib/use-form-errors';
import { useRequestPasswordReset } from '../api/request-password-reset';
import { AuthPanel, textLinkClasses } from '../components/auth-panel';
import { useFocusHeadingWhen } from '../components/use-focus-heading';

export function ResetRequestPage() {
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { formRef, fieldErrors, formMessage, showErrors, showRequestError, clearErrors } = useFormErrors();
  const requestReset = useRequestPasswordReset({
    mutationConfig: { onSuccess: (_, variables) => setSentTo(variables.email), onError: showRequestError },
  });
  useFocusHeadingWhen(sentTo);

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const check = checkForm(passwordResetRequestSchema, formValues(event.currentTarget));
    if (!check.ok) return showErrors(check.fields);
    clearErrors();
    requestReset.mutate(check.data);
  };

  const backToSignIn = (
    <Link to="/sign-in" className={textLinkClasses}>
      Back to sign in
    </Link>
  );

  if (sentTo) {
    return (
      <AuthPanel title="Check your inbox" footer={backToSignIn}>
        <div className="flex flex-col gap-4">
          <p>
            If an account uses <strong className="font-semibold wrap-anywhere">{sentTo}</strong>, we have sent it a link
            to choose a new password. The link works once.
          </p>
          <p className="text-ink-soft">Nothing after a few minutes? Look in your spam folder, or send another link.</p>
          <div>
            <Button variant="secondary" onClick={() => setSentTo(null)}>
              Send another link
            </Button>
          </div>
        </div>
      </AuthPanel>
    );
  }

  return (
    <AuthPanel
      title="Choose a new password"
      description="Enter the e-mail address you sign in with. We will send you a link to set a new password."
      footer={backToSignIn}
    >
      <form ref={formRef} noValidate onSubmit={submit} className="flex flex-col gap-5">
        {formMessage && (
          <StatusMessage tone="problem" formMessage>
            {formMessage}
          </StatusMessage>
        )}
        <TextField label="E-mail address" name="email" type="email" autoComplete="email" error={fieldErrors.email} />
        <div>
          <Button type="submit" busy={requestReset.isPending} busyLabel="Sending…">
            Send the link
          </Button>
        </div>
      </form>
    </AuthPanel>
  );
}
