"use client";
import { MutationCache, QueryCache, QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { useState, type ReactNode } from "react";
import { ApiError } from "@/lib/api-client";
import { workspaceGoneOf, WorkspaceGoneBanner, type WorkspaceGone } from "@/components/workspaces/WorkspaceGone";

/**
 * TanStack Query for the signed-in pages. Refused requests (4xx) are not retried. A request that
 * learns the page's workspace was deleted puts `WorkspaceGoneBanner` over the page.
 */
export function Providers({ children }: { children: ReactNode }) {
  const [gone, setGone] = useState<WorkspaceGone | null>(null);
  const [client] = useState(() => {
    const onError = (err: unknown) => {
      const g = workspaceGoneOf(err);
      if (g) setGone((was) => was ?? g);
    };
    return new QueryClient({
      queryCache: new QueryCache({ onError }),
      mutationCache: new MutationCache({ onError }),
      defaultOptions: {
        queries: {
          staleTime: 15_000,
          retry: (count, err) => !(err instanceof ApiError && err.status >= 400 && err.status < 500) && count < 2,
        },
      },
    });
  });
  return (
    <QueryClientProvider client={client}>
      {gone ? <WorkspaceGoneBanner gone={gone} /> : null}
      {children}
    </QueryClientProvider>
  );
}
