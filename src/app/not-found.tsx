import { Link, useLocation } from "react-router";
import { buttonClasses } from "@/components/ui/button";
import { LogoMark } from "@/components/layouts/logo-mark";
import { Page } from "@/components/layouts/page";
import { paths } from "@/lib/paths";

/** The 404 page: says which address was not found and where to go instead. */
export function NotFound() {
  const location = useLocation();
  return (
    <Page
      title="Nothing at this address"
      lead="The page may have moved, or the link may have a typing error in it."
    >
      <p className="text-steel-700">
        Not found:{" "}
        <code className="figure rounded bg-steel-100 px-1.5 py-0.5 text-steel-900">{location.pathname}</code>
      </p>
      <div className="mt-6 flex flex-wrap gap-3">
        <Link to={paths.home} className={buttonClasses("primary")}>
          Go to the home page
        </Link>
        <Link to={paths.camCheck} className={buttonClasses("secondary")}>
          Open the cam check
        </Link>
      </div>
      <LogoMark className="mt-12 size-40 text-steel-200" />
    </Page>
  );
}
