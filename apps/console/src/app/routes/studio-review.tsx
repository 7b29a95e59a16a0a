import { Link, useParams } from 'react-router-dom';
import { ReviewQueue } from '../../features/review/components/ReviewQueue.tsx';
import { textLinkClass } from '@vatside/ui/link-class.ts';

/** The moderators' and host's review of shared skeins. */
export function Component() {
  const { slug = '' } = useParams();
  return (
    <section aria-labelledby="review-title" className="space-y-4">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h2 id="review-title" className="font-display text-2xl font-semibold">
            Review queue
          </h2>
          <p className="text-vat-800">
            Oldest shares first. Approved skeins join the month’s gallery and the maker gets an
            e-mail.
          </p>
        </div>
        <Link to="audit" className={textLinkClass}>
          Every decision so far
        </Link>
      </div>
      <ReviewQueue slug={slug} />
    </section>
  );
}
