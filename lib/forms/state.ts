/** What every form's server action answers; the form shows it in aria-live regions. */
export interface FormState {
  ok?: boolean;
  message?: string;
  /**
   * How the message reads when it is not the plain outcome: "stop" for a change that was
   * recorded but means the item may not be used (a failed pre-use check), shown in red.
   */
  tone?: "stop";
  fieldErrors?: Record<string, string>;
  values?: Record<string, string>;
}

export const initialFormState: FormState = {};

/**
 * A form's server action as a component receives it (a prop), so that components never
 * import from the app's route folders.
 */
export type FormAction = (previous: FormState, formData: FormData) => Promise<FormState>;
