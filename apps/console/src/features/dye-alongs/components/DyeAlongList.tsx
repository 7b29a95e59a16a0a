import type { DyeAlong } from '@vatside/contracts/dye-alongs';
import { textLinkClass } from '@vatside/ui/link-class.ts';
import { Link } from 'react-router-dom';
import { StatusBadge } from './StatusBadge.tsx';

/** The month's dye-alongs in start order, each a way into its detail. */
export function DyeAlongList({ items, monthLabel }: { items: DyeAlong[]; monthLabel: string }) {
  if (items.length === 0) {
    return <p className="text-lg">Nothing planned for {monthLabel} yet.</p>;
  }
  return (
    <ul className="divide-y divide-wool-200" aria-label={`Dye-alongs in ${monthLabel}`}>
      {items.map((item) => (
        <li key={item.id} className="flex flex-wrap items-center gap-x-4 gap-y-1 py-3">
          <Link to={item.id} className={`${textLinkClass} text-xl`}>
            {item.title}
          </Link>
          <StatusBadge status={item.status} />
          <p className="w-full text-vat-800">
            {item.startsAtHost.label} · about {item.expectedLengthMin} min ·{' '}
            {item.colorways.length === 1 ? '1 colorway' : `${item.colorways.length} colorways`}
          </p>
        </li>
      ))}
    </ul>
  );
}
