import { Link, useNavigate } from "react-router";
import { buttonClasses, Button } from "@/components/ui/button";
import { RoleBadge } from "@/components/ui/role-badge";
import { paths } from "@/lib/paths";
import { useMe } from "../api/get-me";
import { useSignOut } from "../api/sign-out";

/** The header's right side: who is signed in, with their role and a sign-out button; or sign-in links. */
export function AccountMenu() {
  const me = useMe();
  const signOut = useSignOut();
  const navigate = useNavigate();

  if (me.isPending) return <span className="text-sm text-steel-300">Checking sign-in…</span>;
  const user = me.data ?? null;
  if (!user) {
    return (
      <div className="flex items-center gap-2">
        <Link to={paths.signIn} className={buttonClasses("quietOnDark")}>
          Sign in
        </Link>
        <Link to={paths.register} className={buttonClasses("primary")}>
          Create account
        </Link>
      </div>
    );
  }
  return (
    <div className="flex items-center gap-3">
      <div className="text-right leading-tight" data-testid="signed-in-as">
        <span className="sr-only">Signed in as </span>
        <span className="block font-semibold text-white">{user.displayName}</span>
        <RoleBadge role={user.role} />
      </div>
      <Button
        variant="onDark"
        disabled={signOut.isPending}
        onClick={() => signOut.mutate(undefined, { onSuccess: () => navigate(paths.home) })}
      >
        Sign out
      </Button>
    </div>
  );
}
