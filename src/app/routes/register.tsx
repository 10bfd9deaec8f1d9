import { Navigate, useNavigate, useSearchParams } from "react-router";
import { Page } from "@/components/layouts/page";
import { useMe } from "@/features/auth/api/get-me";
import { RegisterForm } from "@/features/auth/components/register-form";
import { safeNextPath } from "@/lib/paths";

export function Component() {
  const [params] = useSearchParams();
  const next = safeNextPath(params.get("next"));
  const navigate = useNavigate();
  const me = useMe();
  if (me.data) return <Navigate to={next} replace />;
  return (
    <Page
      title="Create an account"
      width="narrow"
      lead="Save your vises and machines once, keep your designs, and download drawing packs."
    >
      <div className="rounded-lg border border-steel-200 bg-white p-6 shadow-sm">
        <RegisterForm onRegistered={() => navigate(next, { replace: true })} />
      </div>
    </Page>
  );
}
