import { useCallback, useEffect, useRef, useState } from 'react';
import { isApiRequestError, type FieldErrors } from './api-client';

type FormErrorState = { fields: FieldErrors; message: string | null; shown: number };

const generalFailure = 'Something went wrong. Try again in a moment.';

// Holds a form's inline errors and, each time new errors are shown, moves focus to the first
// invalid field (or to the form's message when no field is to blame), so keyboard and screen
// reader users land where the problem is.
export function useFormErrors() {
  const formRef = useRef<HTMLFormElement>(null);
  const [state, setState] = useState<FormErrorState>({ fields: {}, message: null, shown: 0 });

  useEffect(() => {
    if (state.shown === 0) return;
    const form = formRef.current;
    const target =
      form?.querySelector<HTMLElement>('[aria-invalid="true"]') ??
      form?.querySelector<HTMLElement>('[data-form-message]');
    target?.focus();
  }, [state.shown]);

  const showErrors = useCallback((fields: FieldErrors, message: string | null = null) => {
    setState((previous) => ({ fields, message, shown: previous.shown + 1 }));
  }, []);

  const showRequestError = useCallback(
    (error: unknown) => {
      if (isApiRequestError(error)) showErrors(error.fields ?? {}, error.message);
      else showErrors({}, generalFailure);
    },
    [showErrors],
  );

  const clearErrors = useCallback(() => setState((previous) => ({ ...previous, fields: {}, message: null })), []);

  return { formRef, fieldErrors: state.fields, formMessage: state.message, showErrors, showRequestError, clearErrors };
}

export function errorMessageOf(error: unknown): string {
  return isApiRequestError(error) ? error.message : generalFailure;
}
