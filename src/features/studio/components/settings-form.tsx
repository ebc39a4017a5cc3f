import { useState, type FormEvent } from 'react';
import { updateStudioRequestSchema, type StudioSettings } from '@shared/contracts/studio';
import { Button } from '../../../components/ui/button';
import { StatusMessage } from '../../../components/ui/status-message';
import { TextField } from '../../../components/ui/text-field';
import { checkForm, formValues } from '../../../lib/form-errors';
import { useFormErrors } from '../../../lib/use-form-errors';
import { useUpdateStudio } from '../api/update-studio';
import { settingHint, settingWords } from './setting-words';

const asNumber = (value: string | undefined) => (value === undefined || value.trim() === '' ? undefined : Number(value));

export function SettingsForm({ settings }: { settings: StudioSettings }) {
  const [saved, setSaved] = useState(false);
  const { formRef, fieldErrors, formMessage, showErrors, showRequestError, clearErrors } = useFormErrors();
  const updateStudio = useUpdateStudio({
    mutationConfig: { onSuccess: () => setSaved(true), onError: showRequestError },
  });

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    setSaved(false);
    const values = formValues(event.currentTarget);
    // Every field is required here even though the PATCH accepts any subset: an empty box
    // should read as a mistake, not as "leave unchanged".
    const check = checkForm(updateStudioRequestSchema.required(), {
      name: values.name,
      paletteLimit: asNumber(values.paletteLimit),
      readyWeeksBeforeLaunch: asNumber(values.readyWeeksBeforeLaunch),
    });
    if (!check.ok) return showErrors(check.fields);
    clearErrors();
    updateStudio.mutate(check.data);
  };

  return (
    <form ref={formRef} noValidate onSubmit={submit} onChange={() => setSaved(false)} className="flex max-w-xl flex-col gap-5">
      {formMessage && (
        <StatusMessage tone="problem" formMessage>
          {formMessage}
        </StatusMessage>
      )}
      <TextField label={settingWords.name.label} name="name" defaultValue={settings.name} autoComplete="organization" error={fieldErrors.name} />
      <TextField
        label={settingWords.paletteLimit.label}
        name="paletteLimit"
        type="number"
        inputMode="numeric"
        min={1}
        max={64}
        step={1}
        defaultValue={settings.paletteLimit}
        hint={settingHint('paletteLimit')}
        error={fieldErrors.paletteLimit}
        className="max-w-32"
      />
      <TextField
        label={settingWords.readyWeeksBeforeLaunch.label}
        name="readyWeeksBeforeLaunch"
        type="number"
        inputMode="numeric"
        min={0}
        max={52}
        step={1}
        defaultValue={settings.readyWeeksBeforeLaunch}
        hint={settingHint('readyWeeksBeforeLaunch')}
        error={fieldErrors.readyWeeksBeforeLaunch}
        className="max-w-32"
      />
      <div>
        <Button type="submit" busy={updateStudio.isPending} busyLabel="Saving…">
          Save settings
        </Button>
      </div>
      {saved && <StatusMessage tone="ok">Settings saved.</StatusMessage>}
    </form>
  );
}
