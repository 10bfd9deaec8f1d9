import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Link } from "react-router";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TextField } from "@/components/ui/text-field";
import { paths } from "@/lib/paths";
import { applyServerFieldErrors } from "@/lib/server-field-errors";
import { loginBodySchema, type LoginBody, type PublicUser } from "@/shared/auth";
import { useSignIn } from "../api/sign-in";
import { authFailureMessage } from "./auth-error-message";

const fields = ["email", "password"] as const;

/** E-mail and password, checked with the same schema the server uses. */
export function SignInForm({ onSignedIn }: { onSignedIn: (user: PublicUser) => void }) {
  const signIn = useSignIn();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<LoginBody>({
    resolver: zodResolver(loginBodySchema),
    defaultValues: { email: "", password: "" },
  });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      onSignedIn(await signIn.mutateAsync(values));
    } catch (error) {
      const rest = applyServerFieldErrors(error, fields, form.setError);
      setFormError(authFailureMessage(error, rest));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label="Sign in">
      {formError ? (
        <Notice tone="fault" title="Not signed in">
          {formError}
        </Notice>
      ) : null}
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        error={errors.email?.message}
        {...form.register("email")}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        error={errors.password?.message}
        {...form.register("password")}
      />
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? "Signing in…" : "Sign in"}
      </Button>
      <p className="text-steel-700">
        New here?{" "}
        <Link to={paths.register} className="font-semibold text-spark-700 underline underline-offset-2">
          Create an account
        </Link>
      </p>
    </form>
  );
}
