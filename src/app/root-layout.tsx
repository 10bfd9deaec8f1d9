import { useRef } from "react";
import { Outlet, useNavigation } from "react-router";
import { SiteFooter } from "@/components/layouts/site-footer";
import { SiteHeader, type NavItem } from "@/components/layouts/site-header";
import { AccountMenu } from "@/features/auth/components/account-menu";
import { useMe } from "@/features/auth/api/get-me";
import { paths } from "@/lib/paths";
import { templatesPath } from "@/features/catalogue/paths";
import { designsPath } from "@/features/designs/paths";
import { workshopPath } from "@/features/profiles/paths";
import { RouteAnnouncer, useRouteFocus } from "./route-focus";

/**
 * The app shell: header with navigation and account, the page, the footer with the safety note. On a
 * move to another page, focus goes to its heading and its title is announced (route-focus.tsx).
 */
export function RootLayout() {
  const me = useMe();
  const navigation = useNavigation();
  const mainRef = useRef<HTMLElement>(null);
  const announcement = useRouteFocus(mainRef);
  const nav: NavItem[] = [
    { to: paths.home, label: "Home" },
    { to: templatesPath, label: "Templates" },
    { to: paths.camCheck, label: "Cam check" },
  ];
  if (me.data)
    nav.push({ to: workshopPath, label: "My workshop" }, { to: designsPath, label: "Saved designs" });
  if (me.data?.role === "admin") nav.push({ to: paths.admin, label: "Accounts" });

  return (
    <div className="flex min-h-dvh flex-col">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-white focus:px-3 focus:py-2"
      >
        Skip to content
      </a>
      <SiteHeader nav={nav} account={<AccountMenu />} />
      <div aria-hidden="true" className="h-1 bg-transparent">
        {navigation.state === "loading" ? <div className="h-1 w-1/3 animate-pulse bg-spark-500" /> : null}
      </div>
      <main id="main" ref={mainRef} className="flex-1 outline-none" tabIndex={-1}>
        <Outlet />
      </main>
      <RouteAnnouncer text={announcement} />
      <SiteFooter />
    </div>
  );
}
