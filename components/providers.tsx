"use client";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { useState, type ReactNode } from "react";
import { NavigationWatchdog } from "@/components/ui/navigation-watchdog";

export function Providers({ children }: { children: ReactNode }) {
  const [client] = useState(() => new QueryClient({ defaultOptions: { queries: { staleTime: 15_000, refetchOnWindowFocus: true } } }));
  return (
    <QueryClientProvider client={client}>
      <NavigationWatchdog />
      {children}
    </QueryClientProvider>
  );
}
