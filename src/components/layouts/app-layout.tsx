import { LAB_DECIDES } from '../../../shared/contracts/safety-advice';
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import { NameMark } from '../ui/name-mark';

type AppLayoutProps = {
  homeHref: string;
  /** The lab switcher, the user's name and sign-out, on the right of the header. */
  account: ReactNode;
  navigation: ReactNode;
  /** True while the next page loads. */
  busy: boolean;
  children: ReactNode;
};

export function AppLayout({ homeHref, account, navigation, busy, children }: AppLayoutProps) {
  return (
    <div className="flex min-h-screen flex-col">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-10 focus:rounded focus:bg-surface focus:px-3 focus:py-2"
      >
        Skip to content
      </a>
      {/* Inside the ink header, copper is the lighter tone so rings and marks keep their contrast. */}
      <header className="bg-ink text-paper [--color-accent:var(--color-accent-on-ink)] print:hidden">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center justify-between gap-4 px-6 py-3">
          <Link to={homeHref} className="text-2xl text-paper no-underline">
            <NameMark />
          </Link>
          <div className="flex flex-wrap items-center gap-4">{account}</div>
        </div>
        <div className="mx-auto max-w-6xl px-6">{navigation}</div>
        <div aria-hidden="true" className={`h-1 bg-accent transition-opacity ${busy ? 'opacity-100' : 'opacity-0'}`} />
      </header>
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-6xl flex-1 px-6 py-8 print:max-w-none print:p-0">
        {children}
      </main>
      <footer className="border-t border-line py-4 text-center text-sm text-muted">{LAB_DECIDES}</footer>
    </div>
  );
}
