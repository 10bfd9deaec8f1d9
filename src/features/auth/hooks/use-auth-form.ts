import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import {
  useForm,
  type DefaultValues,
  type FieldValues,
  type Path,
  type UseFormSetError,
} from "react-hook-form";
import type { z } from "zod";
import { applyServerFieldErrors } from "@/lib/server-field-errors";
import { authFailureMessage } from "../components/auth-error-message";

export interface AuthFormOptions<T extends FieldValues, R> {
  /** The server's own body schema (src/shared/auth.ts), so the form says what the server would. */
  schema: z.ZodType<T, T>;
  defaultValues: DefaultValues<T>;
  /** The form's fields, by the `details[].path` the server names them with. */
  fields: ReadonlyArray<Path<T>>;
  send: (values: T) => Promise<R>;
  onDone: (result: R) => void;
  /** A chance to put an error on a field first (true = handled, nothing more is shown). */
  placeError?: (error: unknown, setError: UseFormSetError<T>) => boolean;
}

/**
 * The sign-in and register forms' common part: react-hook-form over the shared schema, and on a refusal
 * each server detail on its field and the rest, in words for the person, above the form.
 */
export function useAuthForm<T extends FieldValues, R>(options: AuthFormOptions<T, R>) {
  const { schema, defaultValues, fields, send, onDone, placeError } = options;
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<T>({ resolver: zodResolver(schema), defaultValues });
  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      onDone(await send(values));
    } catch (error) {
      if (placeError?.(error, form.setError)) return;
      setFormError(authFailureMessage(error, applyServerFieldErrors(error, fields, form.setError)));
    }
  });
  return { form, formError, onSubmit };
}
