'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';
import { useId, useState } from 'react';
import { LogoMark } from './LogoMark';
import { ShellNav } from './ShellNav';
import { SignOutButton } from './SignOutButton';
import { WorkspaceSwitcher } from './WorkspaceSwitcher';

type ShellHeaderProps = {
  userName: string;
};

export function ShellHeader({ userName }: ShellHeaderProps) {
  const pathname = usePathname();
  // Remembering the path the menu was opened on closes it on navigation without an effect.
  const [openOnPath, setOpenOnPath] = useState<string | null>(null);
  const menuOpen = openOnPath === pathname;
  const menuId = useId();

  return (
    <header className="border-b border-rule bg-paper-raised">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-2 sm:px-6">
        <Link href="/" className="flex items-center gap-2 rounded-md py-1 text-ink">
          <LogoMark className="size-7 text-accent" />
          <span className="text-lg font-semibold tracking-tight">Airproof</span>
        </Link>

        <button
          type="button"
          className="ml-auto inline-flex h-9 items-center gap-2 rounded-md border border-rule px-3 text-sm font-medium text-ink md:hidden"
          aria-expanded={menuOpen}
          aria-controls={menuId}
          onClick={() => setOpenOnPath(menuOpen ? null : pathname)}
        >
          <svg
            viewBox="0 0 16 16"
            aria-hidden="true"
            focusable="false"
            className="size-4"
            fill="none"
            stroke="currentColor"
            strokeWidth="1.5"
            strokeLinecap="round"
          >
            {menuOpen ? <path d="m3.5 3.5 9 9m0-9-9 9" /> : <path d="M2 4h12M2 8h12M2 12h12" />}
          </svg>
          Menu
        </button>

        <div
          id={menuId}
          className={`${menuOpen ? 'flex' : 'hidden'} w-full flex-col gap-3 pb-3 md:flex md:w-auto md:flex-1 md:flex-row md:items-center md:gap-4 md:pb-0`}
        >
          <WorkspaceSwitcher />
          <ShellNav />
          <div className="flex items-center justify-between gap-3 border-t border-rule pt-3 md:ml-auto md:border-0 md:pt-0">
            <span className="truncate text-sm text-ink-soft" data-testid="shell-user">
              <span className="sr-only">Signed in as </span>
              {userName}
            </span>
            <SignOutButton />
          </div>
        </div>
      </div>
    </header>
  );
}
