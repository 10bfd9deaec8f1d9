import type { ReactNode } from "react";
import { Link, NavLink } from "react-router";
import { cn } from "@/components/ui/cn";
import { Wordmark } from "./wordmark";

export interface NavItem {
  to: string;
  label: string;
}

/** The top bar: mark and name (home link), the main navigation, and an account area on the right. */
export function SiteHeader({ nav, account }: { nav: NavItem[]; account: ReactNode }) {
  return (
    <header className="border-b-4 border-spark-500 bg-steel-900 text-steel-100">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3">
        <Link to="/" className="rounded-md" aria-label="Jigwright home">
          <Wordmark />
        </Link>
        <nav aria-label="Main" className="order-3 w-full sm:order-none sm:w-auto">
          <ul className="flex flex-wrap gap-1">
            {nav.map((item) => (
              <li key={item.to}>
                <NavLink
                  to={item.to}
                  end={item.to === "/"}
                  className={({ isActive }) =>
                    cn(
                      "inline-flex min-h-11 items-center rounded-md px-3 font-semibold",
                      isActive
                        ? "bg-steel-800 text-spark-300"
                        : "text-steel-200 hover:bg-steel-800 hover:text-white",
                    )
                  }
                >
                  {item.label}
                </NavLink>
              </li>
            ))}
          </ul>
        </nav>
        <div className="ml-auto">{account}</div>
      </div>
    </header>
  );
}
