import { Component, useState, type ErrorInfo, type ReactNode } from 'react';
import { QueryClientProvider } from '@tanstack/react-query';
import { createQueryClient } from '../lib/query-client';
import { ToastProvider } from '../components/ui';

class ErrorBoundary extends Component<{ children: ReactNode }, { error: Error | null }> {
  state = { error: null as Error | null };
  static getDerivedStateFromError(error: Error) {
    return { error };
  }
  componentDidCatch(error: Error, info: ErrorInfo) {
    console.error(error, info.componentStack);
  }
  render() {
    if (!this.state.error) return this.props.children;
    return (
      <div role="alert" className="m-6 rounded-xl border-2 border-ember-600 bg-ember-100 p-6 text-ember-700">
        <p className="text-lg font-bold">Kettlewright hit a problem showing this page.</p>
        <p className="mt-1">Anything waiting to be sent is kept on this device. Reload the page to carry on.</p>
        <button
          className="mt-4 min-h-touch rounded-lg bg-ember-600 px-4 font-semibold text-white"
          onClick={() => location.reload()}
        >
          Reload
        </button>
      </div>
    );
  }
}

export function AppProvider({ children }: { children: ReactNode }) {
  const [client] = useState(createQueryClient);
  return (
    <ErrorBoundary>
      <QueryClientProvider client={client}>
        <ToastProvider>{children}</ToastProvider>
      </QueryClientProvider>
    </ErrorBoundary>
  );
}
