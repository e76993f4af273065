import { Component, type ReactNode } from 'react';
import { PageTitle } from '../../components/page-title';

interface State {
  failed: boolean;
}

/** Keeps the header and footer up when a page fails to render, and offers a reload. */
export class PageErrorBoundary extends Component<{ children: ReactNode }, State> {
  override state: State = { failed: false };

  static getDerivedStateFromError(): State {
    return { failed: true };
  }

  override render() {
    if (!this.state.failed) return this.props.children;
    return (
      <section role="alert" className="flex flex-col items-start gap-4">
        <PageTitle>Something went wrong</PageTitle>
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
