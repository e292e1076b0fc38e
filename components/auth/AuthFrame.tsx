import Link from 'next/link';
import type { ReactNode } from 'react';
import { LogoMark } from '@/components/shell/LogoMark';

type AuthFrameProps = {
  title: string;
  intro?: ReactNode;
  children: ReactNode;
  /** Links to the neighbouring account pages, under the card. */
  footer?: ReactNode;
};

/** The narrow, centred card shared by the pages a visitor sees before entering a workspace. */
export function AuthFrame({ title, intro, children, footer }: AuthFrameProps) {
  return (
    <main id="main" className="flex min-h-dvh items-start justify-center px-4 py-12 sm:items-center">
      <div className="w-full max-w-sm">
        <Link href="/" className="inline-flex items-center gap-2 rounded-md py-1 text-ink">
          <LogoMark className="size-7 text-accent" />
          <span className="text-lg font-semibold tracking-tight">Airproof</span>
        </Link>

        <div className="mt-6 rounded-lg border border-rule bg-paper-raised p-6 shadow-sm">
          <h1 className="text-xl">{title}</h1>
          {intro ? <div className="mt-1 text-sm text-ink-soft">{intro}</div> : null}
          <div className="mt-6">{children}</div>
        </div>

        {footer ? <div className="mt-4 space-y-2 text-sm text-ink-soft">{footer}</div> : null}
      </div>
    </main>
  );
}
