import { textLinkClass } from '@vatside/ui/link-class.ts';
import { Link } from 'react-router-dom';
import { Panel } from '../../../components/Panel.tsx';
import { presenterPath } from '../api.ts';

/** On the dye-along's page: the way to the recap's running order and its presenter. */
export function RecapPanel({ slug, dyeAlongId }: { slug: string; dyeAlongId: string }) {
  return (
    <Panel
      title="Recap"
      intro="Put featured skeins and the month’s colorways in order, then present them full screen while you record."
    >
      <div className="flex flex-wrap gap-x-6">
        <Link to="recap" className={textLinkClass}>
          Recap running order
        </Link>
        <Link to={presenterPath(slug, dyeAlongId)} className={textLinkClass}>
          Open the presenter
        </Link>
      </div>
    </Panel>
  );
}
