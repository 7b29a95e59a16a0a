import { Link, useParams } from 'react-router-dom';
import { AuditLog } from '../../features/review/components/AuditLog.tsx';
import { textLinkClass } from '@vatside/ui/link-class.ts';

/** Who decided what about which skein, and when. */
export function Component() {
  const { slug = '' } = useParams();
  return (
    <section aria-labelledby="audit-title" className="space-y-4">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h2 id="audit-title" className="font-display text-2xl font-semibold">
            Review decisions
          </h2>
          <p className="text-vat-800">Every decision on a shared skein, newest first.</p>
        </div>
        <Link to=".." relative="path" className={textLinkClass}>
          Back to the queue
        </Link>
      </div>
      <AuditLog slug={slug} />
    </section>
  );
}
