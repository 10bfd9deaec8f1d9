import type { ReactNode } from "react";
import { Notice } from "@/components/ui/notice";
import { TextField, type TextFieldProps } from "@/components/ui/text-field";

/** The frame of the sign-in and register forms: the form, and what went wrong above its fields. */
export function AuthFormFrame({
  label,
  onSubmit,
  failureTitle,
  failure,
  children,
}: {
  label: string;
  onSubmit: (event: React.FormEvent<HTMLFormElement>) => void;
  /** Heading of the notice when the server refused, e.g. "Not signed in". */
  failureTitle: string;
  failure: string | null;
  children: ReactNode;
}) {
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label={label}>
      {failure ? (
        <Notice tone="fault" title={failureTitle}>
          {failure}
        </Notice>
      ) : null}
      {children}
    </form>
  );
}

/** The e-mail field both forms ask for first (the account's name at sign-in). */
export function EmailField(props: Omit<TextFieldProps, "label" | "type" | "autoComplete">) {
  return <TextField label="E-mail" type="email" autoComplete="email" {...props} />;
}
