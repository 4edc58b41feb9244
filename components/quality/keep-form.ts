/**
 * React 19 clears a `<form action={…}>` after every submission, so a refused form would lose what was typed.
 * These forms submit through onSubmit instead and reset themselves only when the server accepted the input.
 */
import { startTransition, type FormEvent } from "react";

/** An onSubmit handler that hands the form's data to a useActionState dispatcher without clearing the form. */
export function submitKeepingInput(dispatch: (form: FormData) => void) {
  return (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    startTransition(() => dispatch(form));
  };
}
