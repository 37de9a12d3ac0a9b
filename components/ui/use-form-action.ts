"use client";
import { startTransition, useActionState, useEffect, useRef, type FormEvent } from "react";
import { initialFormState, type FormAction } from "@/lib/forms/state";

/**
 * A server-action form that forgives a gloved mistake: a refused answer keeps every value
 * already given (the form is not reset, files included; it is after a success), and focus moves to the first field
 * marked at fault (`aria-invalid="true"`, in page order), or to the form's message when no
 * field is named. Without JavaScript the form still posts to the action.
 *
 * @example
 * const { state, formProps } = useFormAction(save);
 * return <form {...formProps}>…<FormAlert state={state} /></form>;
 */
export function useFormAction(record: FormAction) {
  const [state, dispatch, pending] = useActionState(record, initialFormState);
  const ref = useRef<HTMLFormElement>(null);

  useEffect(() => {
    const form = ref.current;
    if (!form) return;
    // Done: the form starts afresh for the next entry (as a form action would).
    if (state.ok === true) return form.reset();
    if (state.ok !== false) return;
    const marked = form.querySelector<HTMLElement>('[aria-invalid="true"]');
    // A question (a group of answers) is marked as a whole: its first answer takes the focus.
    const target =
      marked && !marked.matches("input, select, textarea, button")
        ? (marked.querySelector<HTMLElement>("input:not([type=hidden]), select, textarea, button") ?? marked)
        : (marked ?? form.querySelector<HTMLElement>("[data-form-alert]"));
    if (!target) return;
    target.focus({ preventScroll: true });
    target.scrollIntoView({ block: "center" });
  }, [state]);

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    // React resets a form after its action; taking the submit here keeps every answer.
    event.preventDefault();
    const data = new FormData(event.currentTarget, (event.nativeEvent as SubmitEvent).submitter);
    startTransition(() => dispatch(data));
  }

  return { state, pending, formProps: { ref, action: dispatch, onSubmit, noValidate: true } };
}
