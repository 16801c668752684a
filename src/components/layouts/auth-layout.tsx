import type { ReactNode } from 'react';
import { NameMark } from '../ui/name-mark';

/** The signed-out pages: the name mark, one h1 and a single card. */
export function AuthLayout({
  title,
  description,
  children,
}: {
  title: string;
  description?: ReactNode;
  children: ReactNode;
}) {
  return (
    <div className="flex min-h-screen flex-col items-center px-4 py-12">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:rounded focus:bg-surface focus:px-3 focus:py-2"
      >
        Skip to content
      </a>
      <header className="mb-8 text-ink">
        <NameMark className="text-4xl" />
      </header>
      <main id="main" tabIndex={-1} className="w-full max-w-md rounded-lg border border-line bg-surface p-8 shadow-sm">
        <h1 className="mb-2 text-2xl font-bold">{title}</h1>
        {description ? <div className="mb-6 text-muted">{description}</div> : <div className="mb-4" />}
        {children}
      </main>
      <footer className="mt-8 max-w-md text-center text-sm text-muted">
        Dilutrace plans solution preparations and states their concentration with its uncertainty budget.
      </footer>
    </div>
  );
}
