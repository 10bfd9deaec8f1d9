import { createBrowserRouter, type RouteObject } from "react-router";
import { paths } from "@/lib/paths";
import { configuratorRoute, templatesPath } from "@/features/catalogue/paths";
import { designsPath, sharedDesignRoute } from "@/features/designs/paths";
import { workshopPath } from "@/features/profiles/paths";
import { AppCrash } from "./app-crash";
import { LoadingScreen } from "./loading-screen";
import { RootLayout } from "./root-layout";
import { RouteError } from "./route-error";

/**
 * The route table. Each page is its own lazily loaded module (`routes/*.tsx` exporting `Component`),
 * so the first load carries only the shell and the page asked for.
 */
export const routes: RouteObject[] = [
  {
    Component: RootLayout,
    ErrorBoundary: AppCrash,
    HydrateFallback: LoadingScreen,
    children: [
      {
        ErrorBoundary: RouteError,
        children: [
          { index: true, lazy: () => import("./routes/home") },
          { path: paths.signIn, lazy: () => import("./routes/sign-in") },
          { path: paths.register, lazy: () => import("./routes/register") },
          { path: paths.admin, lazy: () => import("./routes/admin") },
          { path: paths.camCheck, lazy: () => import("./routes/cam-check") },
          { path: templatesPath, lazy: () => import("./routes/templates") },
          { path: configuratorRoute, lazy: () => import("./routes/configurator") },
          { path: workshopPath, lazy: () => import("./routes/workshop") },
          { path: designsPath, lazy: () => import("./routes/designs") },
          { path: sharedDesignRoute, lazy: () => import("./routes/shared-design") },
          { path: "*", lazy: () => import("./routes/not-found") },
        ],
      },
    ],
  },
];

export function createAppRouter() {
  return createBrowserRouter(routes);
}
