import type { FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { signInRequestSchema, signUpRequestSchema, type InvitationPreview } from '@shared/contracts/auth';
import { Button } from '../../../components/ui/button';
import { StatusMessage } from '../../../components/ui/status-message';
import { TextField } from '../../../components/ui/text-field';
import { checkForm, formValues } from '../../../lib/form-errors';
import { useFormErrors } from '../../../lib/use-form-errors';
import type { AcceptInvitation } from '../api/accept-invitation';
import { textLinkClasses } from './auth-panel';

// The new-account and existing-account checks reuse the shared sign-up and sign-in rules.
const newAccountSchema = signUpRequestSchema.pick({ name: true, password: true });
const existingAccountSchema = signInRequestSchema.pick({ password: true });

type InvitationFormProps = {
  invitation: InvitationPreview;
  accept: (body: Omit<AcceptInvitation, 'token'>, onError: (error: unknown) => void) => void;
  pending: boolean;
};

export function NewAccountForm({ invitation, accept, pending }: InvitationFormProps) {
  const { formRef, fieldErrors, formMessage, showErrors, showRequestError, clearErrors } = useFormErrors();
  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const check = checkForm(newAccountSchema, formValues(event.currentTarget));
    if (!check.ok) return showErrors(check.fields);
    clearErrors();
    accept(check.data, showRequestError);
  };
  return (
    <form ref={formRef} noValidate onSubmit={submit} className="flex flex-col gap-5">
      <h2 className="text-lg font-semibold">Create your account</h2>
      {formMessage && (
        <StatusMessage tone="problem" formMessage>
          {formMessage}
        </StatusMessage>
      )}
      <AccountName email={invitation.email} />
      <TextField label="Your name" name="name" autoComplete="name" error={fieldErrors.name} />
      <TextField
        label="Password"
        name="password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        error={fieldErrors.password}
      />
      <div>
        <Button type="submit" busy={pending} busyLabel="Joining…">
          Create account and join
        </Button>
      </div>
    </form>
  );
}

export function ExistingAccountForm({ invitation, accept, pending }: InvitationFormProps) {
  const { formRef, fieldErrors, formMessage, showErrors, showRequestError, clearErrors } = useFormErrors();
  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const check = checkForm(existingAccountSchema, formValues(event.currentTarget));
    if (!check.ok) return showErrors(check.fields);
    clearErrors();
    accept(check.data, showRequestError);
  };
  return (
    <form ref={formRef} noValidate onSubmit={submit} className="flex flex-col gap-5">
      <div>
        <h2 className="text-lg font-semibold">Sign in to join</h2>
        <p className="text-ink-soft">
          You already have a Motifold account as <span className="font-semibold wrap-anywhere text-ink">{invitation.email}</span>.
        </p>
      </div>
      {formMessage && (
        <StatusMessage tone="problem" formMessage>
          {formMessage}
        </StatusMessage>
      )}
      <AccountName email={invitation.email} />
      <TextField
        label="Password"
        name="password"
        type="password"
        autoComplete="current-password"
        error={fieldErrors.password}
      />
      <div className="flex flex-wrap items-center justify-between gap-3">
        <Button type="submit" busy={pending} busyLabel="Joining…">
          Sign in and join
        </Button>
        <Link to="/forgot-password" className={textLinkClasses}>
          Forgot your password?
        </Link>
      </div>
    </form>
  );
}

// Not shown (the invitation above names the address); lets password managers file the new
// password under the right account.
function AccountName({ email }: { email: string }) {
  return <input type="text" name="username" value={email} autoComplete="username" readOnly hidden />;
}
