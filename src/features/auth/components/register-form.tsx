import { useState } from "react";
import { Link } from "react-router";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/text-field";
import { ApiError } from "@/lib/api-error";
import { paths } from "@/lib/paths";
import { passwordMinLength, registerBodySchema, type PublicUser } from "@/shared/auth";
import { useRegister } from "../api/register";
import { useAuthForm } from "../hooks/use-auth-form";
import { AuthFormFrame, EmailField } from "./auth-form-frame";

const fields = ["displayName", "email", "password"] as const;

/** A new machinist account: name, e-mail and password, validated with the server's own schema. */
export function RegisterForm({ onRegistered }: { onRegistered: (user: PublicUser) => void }) {
  const registerAccount = useRegister();
  const [showPassword, setShowPassword] = useState(false);
  const { form, formError, onSubmit } = useAuthForm({
    schema: registerBodySchema,
    defaultValues: { displayName: "", email: "", password: "" },
    fields,
    send: registerAccount.mutateAsync,
    onDone: onRegistered,
    placeError: (error, setError) => {
      // A taken e-mail may come back as a bare 409: it is still about the e-mail field.
      if (!(error instanceof ApiError && error.code === "conflict" && error.details.length === 0))
        return false;
      setError("email", { type: "server", message: error.message });
      return true;
    },
  });
  const { errors, isSubmitting } = form.formState;

  return (
    <AuthFormFrame
      label="Create account"
      onSubmit={onSubmit}
      failureTitle="Account not created"
      failure={formError}
    >
      <TextField
        label="Your name"
        hint="Shown in the header and on designs you share."
        autoComplete="name"
        error={errors.displayName?.message}
        {...form.register("displayName")}
      />
      <EmailField error={errors.email?.message} {...form.register("email")} />
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
    </AuthFormFrame>
  );
}
