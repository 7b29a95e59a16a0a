import type { Page } from '@vatside/contracts/workbench-common';
import { Button } from '@vatside/ui/Button';

/** "Showing 26–50 of 61" with earlier and later pages; hidden when one page holds everything. */
export function Pager({
  page,
  noun,
  onOffset,
}: {
  page: Page;
  noun: string;
  onOffset: (offset: number) => void;
}) {
  if (page.total <= page.limit && page.offset === 0) return null;
  const last = Math.min(page.offset + page.limit, page.total);
  return (
    <div className="flex flex-wrap items-center gap-3">
      <p aria-live="polite">
        Showing {page.offset + 1}–{last} of {page.total} {noun}
      </p>
      <Button
        variant="secondary"
        disabled={page.offset === 0}
        onClick={() => onOffset(Math.max(0, page.offset - page.limit))}
      >
        Earlier
      </Button>
      <Button
        variant="secondary"
        disabled={last >= page.total}
        onClick={() => onOffset(page.offset + page.limit)}
      >
        Later
      </Button>
    </div>
  );
}
