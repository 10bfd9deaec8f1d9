import { Link, Navigate, useNavigate, useSearchParams } from "react-router";
import { Page } from "@/components/layouts/page";
import { useMe } from "@/features/auth/api/get-me";
import { SignInForm } from "@/features/auth/components/sign-in-form";
import { paths, safeNextPath } from "@/lib/paths";

export function Component() {
  const [params] = useSearchParams();
  const next = safeNextPath(params.get("next"));
  const navigate = useNavigate();
  const me = useMe();
  if (me.data) return <Navigate to={next} replace />;
  return (
    <Page
      title="Sign in"
      width="narrow"
      lead="Your vise and machine profiles, saved designs and drawing packs are waiting."
    >
      <div className="rounded-lg border border-steel-200 bg-white p-6 shadow-sm">
        <SignInForm onSignedIn={() => navigate(next, { replace: true })} />
      </div>
      <p className="mt-4 text-sm text-steel-600">
        No account needed for the{" "}
        <Link to={paths.camCheck} className="font-semibold text-spark-700 underline">
          cam check
        </Link>
        .
      </p>
    </Page>
  );
}
