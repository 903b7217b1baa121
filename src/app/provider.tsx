import { QueryClientProvider } from '@tanstack/react-query';
import { Component, useState, type ErrorInfo, type ReactNode } from 'react';
import { createQueryClient } from '@/lib/query-client.ts';

class ErrorBoundary extends Component<{ children: ReactNode }, { failed: boolean }> {
  state = { failed: false };
  static getDerivedStateFromError() {
    return { failed: true };
  }
  componentDidCatch(error: Error, info: ErrorInfo) {
    console.error(error, info.componentStack);
  }
  render() {
    if (!this.state.failed) return this.props.children;
    return (
      <div role="alert" className="mx-auto max-w-lg p-10 text-ink">
        <h1 className="text-xl font-semibold">Something went wrong on this screen</h1>
        <p className="mt-2 text-sm text-muted">Nothing you saved is lost. Reload the page to carry on.</p>
        <button
          type="button"
          className="mt-4 rounded-md bg-accent px-3 py-2 text-sm text-on-accent"
          onClick={() => location.reload()}
        >
          Reload
        </button>
      </div>
    );
  }
}

/** Everything the app needs around it: the query cache and a last-resort error screen. */
export function AppProvider({ children }: { children: ReactNode }) {
  const [queryClient] = useState(createQueryClient);
  return (
    <ErrorBoundary>
      <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
    </ErrorBoundary>
  );
}
