import { useState, type FormEvent } from 'react';
import { createInvitationRequestSchema } from '@shared/contracts/studio';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/select-field';
import { StatusMessage } from '../../../components/ui/status-message';
import { TextField } from '../../../components/ui/text-field';
import { checkForm, formValues } from '../../../lib/form-errors';
import { formatDay } from '../../../lib/format';
import { useFormErrors } from '../../../lib/use-form-errors';
import { roleOptions, roleSummaries } from '../../auth/components/role-words';
import { useCreateInvitation } from '../api/create-invitation';

const invitableRoles = createInvitationRequestSchema.shape.role.options;
type InvitableRole = (typeof invitableRoles)[number];

export function InviteForm() {
  const [role, setRole] = useState<InvitableRole>('editor');
  const [sent, setSent] = useState<string | null>(null);
  const { formRef, fieldErrors, formMessage, showErrors, showRequestError, clearErrors } = useFormErrors();
  const createInvitation = useCreateInvitation({
    mutationConfig: {
      onSuccess: (invitation) => {
        formRef.current?.reset();
        setRole('editor');
        setSent(`Invitation sent to ${invitation.email}. The link in it works until ${formatDay(invitation.expiresAt)}.`);
      },
      onError: showRequestError,
    },
  });

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    setSent(null);
    const check = checkForm(createInvitationRequestSchema, formValues(event.currentTarget));
    if (!check.ok) return showErrors(check.fields);
    clearErrors();
    createInvitation.mutate(check.data);
  };

  return (
    <form ref={formRef} noValidate onSubmit={submit} className="flex flex-col gap-4">
      {formMessage && (
        <StatusMessage tone="problem" formMessage>
          {formMessage}
        </StatusMessage>
      )}
      <div className="grid gap-4 md:grid-cols-[minmax(0,1fr)_16rem]">
        <TextField
          label="E-mail address"
          name="email"
          type="email"
          autoComplete="off"
          error={fieldErrors.email}
        />
        <SelectField
          label="Role"
          name="role"
          value={role}
          onChange={(event) => setRole(event.target.value as InvitableRole)}
          options={roleOptions(invitableRoles)}
          hint={roleSummaries[role]}
          hintPlacement="below"
          error={fieldErrors.role}
        />
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" busy={createInvitation.isPending} busyLabel="Sending…">
          Send invitation
        </Button>
      </div>
      {sent && <StatusMessage tone="ok">{sent}</StatusMessage>}
    </form>
  );
}
