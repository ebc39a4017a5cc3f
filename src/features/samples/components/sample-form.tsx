import { useId, useState, type FormEvent } from 'react';
import type { Sample } from '@shared/contracts/samples';
import { minorToInput } from '@shared/samples/money';
import { checkSampleDates } from '@shared/samples/sample-dates';
import { Button } from '../../../components/ui/button';
import { borderFor, controlClasses, describedBy, FieldFrame } from '../../../components/ui/field-parts';
import { StatusMessage } from '../../../components/ui/status-message';
import { TextField } from '../../../components/ui/text-field';
import { useFormErrors } from '../../../lib/use-form-errors';
import { useCreateSample } from '../api/create-sample';
import { useUpdateSample } from '../api/update-sample';
import { todayIso } from '../sample-words';

type SampleFormProps = {
  productId: string;
  /** The sample being edited; without it the form records a new one. */
  sample?: Sample;
  defaultCurrency?: string;
  onDone: () => void;
  onCancel: () => void;
};

type Values = { orderedOn: string; printer: string; cost: string; currency: string; expectedOn: string; receivedOn: string; notes: string };

const currencyCodes = typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('currency') : ['EUR', 'GBP', 'JPY', 'USD'];

function initialValues(sample: Sample | undefined, defaultCurrency: string): Values {
  if (!sample) return { orderedOn: todayIso(), printer: '', cost: '', currency: defaultCurrency, expectedOn: '', receivedOn: '', notes: '' };
  return {
    orderedOn: sample.orderedOn,
    printer: sample.printer,
    cost: sample.costMinor !== null && sample.currency ? minorToInput(sample.costMinor, sample.currency) : '',
    currency: sample.currency ?? defaultCurrency,
    expectedOn: sample.expectedOn ?? '',
    receivedOn: sample.receivedOn ?? '',
    notes: sample.notes,
  };
}

export function SampleForm({ productId, sample, defaultCurrency = 'GBP', onDone, onCancel }: SampleFormProps) {
  const [values, setValues] = useState<Values>(() => initialValues(sample, defaultCurrency));
  const { formRef, fieldErrors, formMessage, showErrors, showRequestError, clearErrors } = useFormErrors();
  const create = useCreateSample({ mutationConfig: { onSuccess: onDone, onError: showRequestError } });
  const update = useUpdateSample({ mutationConfig: { onSuccess: onDone, onError: showRequestError } });
  const notesId = useId();
  const currencyListId = useId();
  const pending = create.isPending || update.isPending;

  const set = (name: keyof Values) => (event: { target: { value: string } }) => setValues((v) => ({ ...v, [name]: event.target.value }));

  const submit = (event: FormEvent) => {
    event.preventDefault();
    clearErrors();
    const problem = checkSampleDates({ orderedOn: values.orderedOn, expectedOn: values.expectedOn || null, receivedOn: values.receivedOn || null });
    if (!values.orderedOn) return showErrors({ orderedOn: 'Enter the day the sample was ordered' });
    if (problem) return showErrors({ [problem.field]: problem.message });
    const body = {
      orderedOn: values.orderedOn,
      printer: values.printer,
      cost: values.cost,
      currency: values.currency,
      expectedOn: values.expectedOn || null,
      receivedOn: values.receivedOn || null,
      notes: values.notes,
    };
    if (sample) update.mutate({ id: sample.id, productId, changes: body });
    else create.mutate({ productId, sample: body });
  };

  return (
    <form ref={formRef} onSubmit={submit} noValidate className="flex flex-col gap-4 rounded-lg border border-sand bg-shell/60 p-4" aria-label={sample ? 'Edit sample order' : 'Record a sample order'}>
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Ordered on" name="orderedOn" type="date" required value={values.orderedOn} onChange={set('orderedOn')} error={fieldErrors.orderedOn} />
        <TextField label="Printer" name="printer" optional maxLength={200} placeholder="Harbour Print Co." value={values.printer} onChange={set('printer')} error={fieldErrors.printer} />
        <TextField label="Cost" name="cost" optional inputMode="decimal" placeholder="12.50" hint="As on the printer’s invoice, with shipping if you like" value={values.cost} onChange={set('cost')} error={fieldErrors.cost} />
        <TextField label="Currency" name="currency" list={currencyListId} maxLength={3} autoComplete="off" hint="Three letters: GBP, EUR, USD, JPY…" value={values.currency} onChange={set('currency')} error={fieldErrors.currency} />
        <datalist id={currencyListId}>
          {currencyCodes.map((code) => (
            <option key={code} value={code} />
          ))}
        </datalist>
        <TextField label="Expected on" name="expectedOn" type="date" optional value={values.expectedOn} onChange={set('expectedOn')} error={fieldErrors.expectedOn} />
        <TextField label="Received on" name="receivedOn" type="date" optional value={values.receivedOn} onChange={set('receivedOn')} error={fieldErrors.receivedOn} />
      </div>
      <FieldFrame id={notesId} label="Notes" optional error={fieldErrors.notes}>
        <textarea
          id={notesId}
          name="notes"
          rows={3}
          maxLength={4000}
          placeholder="Order number, what changed since the last sample"
          value={values.notes}
          onChange={set('notes')}
          aria-invalid={fieldErrors.notes ? true : undefined}
          aria-describedby={describedBy(notesId, undefined, fieldErrors.notes)}
          className={`${controlClasses} ${borderFor(fieldErrors.notes)}`}
        />
      </FieldFrame>
      {formMessage && (
        <StatusMessage tone="problem" formMessage>
          {formMessage}
        </StatusMessage>
      )}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={pending} busyLabel="Saving…">
          {sample ? 'Save changes' : 'Record sample'}
        </Button>
        <Button variant="secondary" onClick={onCancel} disabled={pending}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
