import { useQuery } from '@tanstack/react-query';
import { NavLink } from 'react-router-dom';
import { waitingCountQueryOptions } from '../api.ts';

/** The studio's link to the review queue, with how many skeins wait. */
export function ReviewNavLink({
  slug,
  className,
}: {
  slug: string;
  className: (active: boolean) => string;
}) {
  const { data: waiting } = useQuery(waitingCountQueryOptions(slug));
  return (
    <NavLink to="review" className={({ isActive }) => className(isActive)}>
      Review
      {waiting ? (
        <span className="ml-2 rounded-full bg-marigold-300 px-2 text-sm text-vat-950">
          {waiting}
          <span className="sr-only"> waiting</span>
        </span>
      ) : null}
    </NavLink>
  );
}
