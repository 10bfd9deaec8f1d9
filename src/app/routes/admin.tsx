import { Link, Navigate, useLocation } from "react-router";
import { Page } from "@/components/layouts/page";
import { Notice } from "@/components/ui/notice";
import { Spinner } from "@/components/ui/spinner";
import { AdminUsers } from "@/features/admin/components/admin-users";
import { useMe } from "@/features/auth/api/get-me";
import { paths } from "@/lib/paths";

/** Accounts and roles: admins only. Guests are sent to sign in; other roles are told why not. */
export function Component() {
  const me = useMe();
  const location = useLocation();
  if (me.isPending)
    return (
      <Page title="Accounts">
        <Spinner label="Checking your sign-in" />
      </Page>
    );
  if (me.isError) {
    return (
      <Page title="Accounts">
        <Notice tone="fault" title="Could not check who is signed in">
          {me.error.message}
        </Notice>
      </Page>
    );
  }
  const user = me.data;
  if (!user) return <Navigate to={`${paths.signIn}?next=${encodeURIComponent(location.pathname)}`} replace />;
  if (user.role !== "admin") {
    return (
      <Page title="Accounts">
        <Notice tone="caution" title="For administrators only">
          You are signed in as a {user.role}. Managing accounts and roles needs the admin role.{" "}
          <Link to={paths.home} className="font-semibold underline">
            Back to the home page
          </Link>
        </Notice>
      </Page>
    );
  }
  return (
    <Page
      title="Accounts and roles"
      lead="Everyone with a Jigwright account, and the role that decides what they may do."
    >
      <AdminUsers currentUserId={user.id} />
    </Page>
  );
}
