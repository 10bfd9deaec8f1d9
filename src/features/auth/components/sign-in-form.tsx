import { Link } from "react-router";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/text-field";
import { paths } from "@/lib/paths";
import { loginBodySchema, type PublicUser } from "@/shared/auth";
import { useSignIn } from "../api/sign-in";
import { useAuthForm } from "../hooks/use-auth-form";
import { AuthFormFrame, EmailField } from "./auth-form-frame";

const fields = ["email", "password"] as const;

/** E-mail and password, checked with the same schema the server uses. */
export function SignInForm({ onSignedIn }: { onSignedIn: (user: PublicUser) => void }) {
  const signIn = useSignIn();
  const { form, formError, onSubmit } = useAuthForm({
    schema: loginBodySchema,
    defaultValues: { email: "", password: "" },
    fields,
    send: signIn.mutateAsync,
    onDone: onSignedIn,
  });
  const { errors, isSubmitting } = form.formState;

  return (
    <AuthFormFrame label="Sign in" onSubmit={onSubmit} failureTitle="Not signed in" failure={formError}>
      <EmailField error={errors.email?.message} {...form.register("email")} />
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
    </AuthFormFrame>
  );
}
