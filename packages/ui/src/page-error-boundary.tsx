import { Component, type ReactNode } from 'react';

interface State {
  failed: boolean;
}

/** Keeps the header (and footer) up when a page fails to render, and offers a reload. */
export class PageErrorBoundary extends Component<{ appName: string; children: ReactNode }, State> {
  override state: State = { failed: false };

  static getDerivedStateFromError(): State {
    return { failed: true };
  }

  override render() {
    if (!this.state.failed) return this.props.children;
    return (
      <section role="alert" className="flex flex-col items-start gap-4">
        <title>{`Something went wrong · ${this.props.appName}`}</title>
        <h1 tabIndex={-1} className="text-3xl">
          Something went wrong on this page
        </h1>
        <p>Reloading usually helps. Your orders are safe either way.</p>
        <button type="button" className="btn btn-primary" onClick={() => window.location.reload()}>
          Reload the page
        </button>
      </section>
    );
  }
}
