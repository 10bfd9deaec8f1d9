import type { ReactNode } from "react";
import { Navigate, useLocation } from "react-router";
import { Page } from "@/components/layouts/page";
import { Notice } from "@/components/ui/notice";
import { Spinner } from "@/components/ui/spinner";
import { useMe } from "@/features/auth/api/get-me";
import { paths } from "@/lib/paths";

/**
 * A page for any signed-in role: guests are sent to sign in and brought back here afterwards.
 * `children` renders only once someone is signed in.
 */
export function SignedInPage({
  title,
  lead,
  children,
}: {
  title: string;
  lead?: ReactNode;
  children: ReactNode;
}) {
  const me = useMe();
  const location = useLocation();
  if (me.isPending) {
    return (
      <Page title={title}>
        <Spinner label="Checking your sign-in" />
      </Page>
    );
  }
  if (me.isError) {
    return (
      <Page title={title}>
        <Notice tone="fault" title="Could not check who is signed in">
          {me.error.message}
        </Notice>
      </Page>
    );
  }
  if (!me.data) {
    const next = `${location.pathname}${location.search}`;
    return <Navigate to={`${paths.signIn}?next=${encodeURIComponent(next)}`} replace />;
  }
  return (
    <Page title={title} lead={lead}>
      {children}
    </Page>
  );
}
