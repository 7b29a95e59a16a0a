import { useQuery } from '@tanstack/react-query';
import { buttonClass } from '@vatside/ui/Button';
import { useMe } from '@vatside/ui/session.ts';
import { Link, useSearchParams } from 'react-router-dom';
import { Panel } from '../../components/Panel.tsx';
import { QueryView } from '../../components/QueryView.tsx';
import { dyeAlongMonthQueryOptions } from '../../features/dye-alongs/api.ts';
import { DyeAlongList } from '../../features/dye-alongs/components/DyeAlongList.tsx';
import { MonthPicker, monthName } from '../../features/dye-alongs/components/MonthPicker.tsx';
import { monthIn } from '../../features/dye-alongs/zoned.ts';
import { useWorkbench } from './workbench-role.ts';

/** The studio's dye-alongs, one month at a time (the month kept in the address). */
export function Component() {
  const { slug, canEdit } = useWorkbench();
  const { data: me } = useMe();
  const timeZone = me?.profile.timeZone ?? 'UTC';
  const [params, setParams] = useSearchParams();
  const month = params.get('month') ?? monthIn(timeZone);
  const list = useQuery(dyeAlongMonthQueryOptions(slug, month, timeZone));
  return (
    <Panel
      title="Dye-alongs"
      intro={`Months are read on your own clock (${timeZone}).`}
      actions={
        canEdit ? (
          <Link to="new" className={buttonClass()}>
            Plan a dye-along
          </Link>
        ) : null
      }
    >
      <MonthPicker month={month} onChange={(next) => setParams({ month: next })} />
      <QueryView query={list} loading="Fetching the month…" failed="The month could not be loaded">
        {(data) => <DyeAlongList items={data.items} monthLabel={monthName(month)} />}
      </QueryView>
    </Panel>
  );
}
