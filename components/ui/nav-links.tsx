'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';

export interface NavItem {
  href: string;
  label: string;
}

export function NavLinks({ items }: { items: NavItem[] }) {
  const pathname = usePathname();
  return (
    <nav aria-label="Main" className="overflow-x-auto px-2 pb-2">
      <ul className="flex gap-1 lg:flex-col">
        {items.map((item) => {
          const active = item.href === '/' ? pathname === '/' : pathname.startsWith(item.href);
          return (
            <li key={item.href}>
              <Link
                href={item.href}
                aria-current={active ? 'page' : undefined}
                className={`flex min-h-touch items-center whitespace-nowrap rounded-md px-3 text-sm font-medium ${
                  active ? 'bg-verdigris-50 text-verdigris-700 ring-1 ring-verdigris-100' : 'text-ink-soft hover:bg-paper-deep'
                }`}
              >
                {active ? <span aria-hidden="true" className="mr-2 inline-block h-4 w-1 rounded bg-verdigris-500" /> : null}
                {item.label}
              </Link>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
