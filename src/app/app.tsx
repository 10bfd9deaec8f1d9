import { useState } from "react";
import { RouterProvider } from "react-router/dom";
import { makeQueryClient } from "@/lib/query-client";
import { AppProvider } from "./provider";
import { createAppRouter } from "./router";

export function App() {
  const [queryClient] = useState(makeQueryClient);
  const [router] = useState(createAppRouter);
  return (
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>
  );
}
