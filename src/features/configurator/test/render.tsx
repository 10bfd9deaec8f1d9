import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { render } from "@testing-library/react";
import type { ReactNode } from "react";
import { createMemoryRouter, RouterProvider } from "react-router";
import { vi } from "vitest";

/** Renders `element` at `url` inside a fresh query client (no retries) and a memory router. */
export function renderAt(element: ReactNode, url = "/templates/test-stop") {
  const queryClient = new QueryClient({
    defaultOptions: { queries: { retry: false }, mutations: { retry: false } },
  });
  const router = createMemoryRouter(
    [
      { path: "/templates/:id", element },
      { path: "*", element },
    ],
    { initialEntries: [url] },
  );
  const view = render(
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
  return { ...view, router, queryClient };
}

export const reply = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { "content-type": "application/json" } });

export interface RecordedCall {
  url: string;
  method: string;
  body: unknown;
}

/** A fetch stand-in: `answer` maps a request to a response; every call is recorded. CSRF is answered for it. */
export function fakeServer(answer: (call: RecordedCall) => Response | Promise<Response>) {
  const calls: RecordedCall[] = [];
  const mock = vi.fn(async (url: string, init: RequestInit = {}) => {
    if (url === "/api/auth/csrf") return reply(200, { csrfToken: "test-token" });
    const call = {
      url,
      method: init.method ?? "GET",
      body: typeof init.body === "string" ? (JSON.parse(init.body) as unknown) : undefined,
    };
    calls.push(call);
    return answer(call);
  });
  vi.stubGlobal("fetch", mock);
  return calls;
}
