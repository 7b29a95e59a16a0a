import { buttonClass } from '@vatside/ui/Button';
import { Link } from 'react-router-dom';

/** On the studio's page, for members: the skeins they have shared here. */
export function MySkeinsLink({ slug }: { slug: string }) {
  return (
    <Link to={`/s/${slug}/my-skeins`} className={buttonClass('secondary', 'hand')}>
      My skeins
    </Link>
  );
}
