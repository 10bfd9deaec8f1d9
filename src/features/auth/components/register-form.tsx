import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Link } from "react-router";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TextField } from "@/components/ui/text-field";
import { ApiError } from "@/lib/api-error";
import { paths } from "@/lib/paths";
import { applyServerFieldErrors } from "@/lib/server-field-errors";
import { passwordMinLength, registerBodySchema, type PublicUser, type RegisterBody } from "@/shared/auth";
import { useRegister } from "../api/register";
import { authFailureMessage } from "./auth-error-message";

const fields = ["displayName", "email", "password"] as const;

/** A new machinist account: name, e-mail and password, validated with the server's own schema. */
export function RegisterForm({ onRegistered }: { onRegistered: (user: PublicUser) => void }) {
  const registerAccount = useRegister();
  const [formError, setFormError] = useState<string | null>(null);
  const [showPassword, setShowPassword] = useState(false);
  const form = useForm<RegisterBody>({
    resolver: zodResolver(registerBodySchema),
    defaultValues: { displayName: "", email: "", password: "" },
  });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      onRegistered(await registerAccount.mutateAsync(values));
    } catch (error) {
      // A taken e-mail may come back as a bare 409: it is still about the e-mail field.
      if (error instanceof ApiError && error.code === "conflict" && error.details.length === 0) {
        form.setError("email", { type: "server", message: error.message });
        return;
      }
      const rest = applyServerFieldErrors(error, fields, form.setError);
      setFormError(authFailureMessage(error, rest));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-5" aria-label="Create account">
      {formError ? (
        <Notice tone="fault" title="Account not created">
          {formError}
        </Notice>
      ) : null}
      <TextField
        label="Your name"
        hint="Shown in the header and on designs you share."
        autoComplete="name"
        error={errors.displayName?.message}
        {...form.register("displayName")}
      />
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        error={errors.email?.message}
        {...form.register("email")}
      />
      <TextField
        label="Password"
        type={showPassword ? "text" : "password"}
        hint={`At least ${passwordMinLength} characters. A few unrelated words make a strong one.`}
        autoComplete="new-password"
        error={errors.password?.message}
        {...form.register("password")}
      />
      <label className="-mt-2 inline-flex items-center gap-2 text-steel-700">
        <input
          type="checkbox"
          className="size-5 accent-spark-600"
          checked={showPassword}
          onChange={(e) => setShowPassword(e.target.checked)}
        />
        Show password
      </label>
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? "Creating account…" : "Create account"}
      </Button>
      <p className="text-steel-700">
        Already have an account?{" "}
        <Link to={paths.signIn} className="font-semibold text-spark-700 underline underline-offset-2">
          Sign in
        </Link>
      </p>
    </form>
  );
}
