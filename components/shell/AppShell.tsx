import type { ReactNode } from 'react';
import { SafetyNote } from './SafetyNote';
import { ShellHeader } from './ShellHeader';

type AppShellProps = {
  userName: string;
  children: ReactNode;
  /** `full` gives the page the whole window width (the circuit editor); pages read best at `page`. */
  width?: 'page' | 'full';
};

/** The frame around every signed-in page: header with workspace and account, caution in the footer. */
export function AppShell({ userName, children, width = 'page' }: AppShellProps) {
  return (
    <div className="flex min-h-dvh flex-col">
      <a
        href="#main"
        className="sr-only rounded-md bg-paper-raised px-3 py-2 text-sm font-medium text-ink focus:not-sr-only focus:absolute focus:left-4 focus:top-2 focus:z-50"
      >
        Skip to content
      </a>
      {/* A printed report needs no navigation. */}
      <div className="print:hidden">
        <ShellHeader userName={userName} />
      </div>
      <main id="main" className={`mx-auto w-full flex-1 ${width === 'full' ? 'px-2 py-3 sm:px-4' : 'max-w-6xl px-4 py-6 sm:px-6 sm:py-8'}`}>
        {children}
      </main>
      <footer className="border-t border-rule bg-paper-raised">
        <div className="mx-auto max-w-6xl px-4 py-4 sm:px-6">
          <SafetyNote />
        </div>
      </footer>
    </div>
  );
}
