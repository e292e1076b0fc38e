'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';
import { useCan } from '@/components/workspace/use-current-workspace';

export function ShellNav() {
  const pathname = usePathname();
  const canReadMailbox = useCan('mailbox:read');

  const links = [
    { href: '/circuits', label: 'Circuits' },
    { href: '/reviews', label: 'Reviews' },
    { href: '/workspace/members', label: 'Members' },
    ...(canReadMailbox ? [{ href: '/mailbox', label: 'Mailbox' }] : []),
  ];

  return (
    <nav aria-label="Main">
      <ul className="flex flex-col gap-1 md:flex-row md:gap-2">
        {links.map(({ href, label }) => {
          const current = pathname === href || pathname.startsWith(`${href}/`);
          return (
            <li key={href}>
              <Link
                href={href}
                aria-current={current ? 'page' : undefined}
                className={[
                  'block rounded-md px-3 py-1.5 text-sm font-medium',
                  current
                    ? 'bg-accent-soft text-accent-strong'
                    : 'text-ink-soft hover:bg-paper-sunk hover:text-ink',
                ].join(' ')}
              >
                {label}
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
