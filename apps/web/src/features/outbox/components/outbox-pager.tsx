import { Button, ButtonGroup } from '@blueprintjs/core';
import { ChevronLeftIcon, ChevronRightIcon } from '@blueprintjs/icons';

type Props = { page: number; hasMore: boolean; onPage: (page: number) => void };

/** Older and newer pages; nothing when everything fits on the first page. */
export function OutboxPager({ page, hasMore, onPage }: Props) {
  if (page === 1 && !hasMore) return null;
  return (
    <nav className="tr-outbox-pager" aria-label="Outbox pages">
      <span className="tr-muted">Page {page}</span>
      <ButtonGroup>
        <Button icon={<ChevronLeftIcon />} text="Newer" disabled={page <= 1} onClick={() => onPage(page - 1)} />
        <Button endIcon={<ChevronRightIcon />} text="Older" disabled={!hasMore} onClick={() => onPage(page + 1)} />
      </ButtonGroup>
    </nav>
  );
}
