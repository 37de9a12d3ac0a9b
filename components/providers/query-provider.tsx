"use client";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { useState } from "react";

/**
 * A react-query client for the screens that fetch from /api/v1: given by the layouts of the
 * areas that have such screens (stock, kits, check, ratings), so that other pages, the scan
 * and item pages above all, do not load react-query.
 */
export function QueryProvider({ children }: { children: React.ReactNode }) {
  const [client] = useState(
    () => new QueryClient({ defaultOptions: { queries: { staleTime: 15_000, retry: 1, refetchOnWindowFocus: false } } }),
  );
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}
