/** What every form's server action answers; the form shows it in aria-live regions. */
export interface FormState {
  ok?: boolean;
  message?: string;
  fieldErrors?: Record<string, string>;
  values?: Record<string, string>;
}

export const initialFormState: FormState = {};
