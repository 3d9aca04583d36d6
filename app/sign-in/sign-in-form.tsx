"use client";

import { useActionState } from "react";
import { signInAction, type SignInState } from "./actions";

export function SignInForm({ next }: { next: string }) {
  const [state, action, pending] = useActionState<SignInState, FormData>(signInAction, { error: null, email: "" });
  return (
    <form action={action} className="panel sign-in" aria-describedby={state.error ? "sign-in-error" : undefined}>
      {state.error ? (
        <p id="sign-in-error" className="form-errors" role="alert">
          {state.error}
        </p>
      ) : null}
      <input type="hidden" name="next" value={next} />
      <div className="field">
        <label htmlFor="email">Email</label>
        <input id="email" name="email" type="email" autoComplete="username" required autoFocus defaultValue={state.email} aria-invalid={state.error ? true : undefined} />
      </div>
      <div className="field">
        <label htmlFor="password">Password</label>
        <input id="password" name="password" type="password" autoComplete="current-password" required aria-invalid={state.error ? true : undefined} />
      </div>
      <button type="submit" className="primary" disabled={pending}>
        {pending ? "Signing in…" : "Sign in"}
      </button>
    </form>
  );
}
