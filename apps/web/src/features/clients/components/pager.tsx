import { Button, ButtonGroup } from '@blueprintjs/core';
import { ChevronLeftIcon, ChevronRightIcon } from '@blueprintjs/icons';

type Props = { label: string; page: number; pageSize: number; total: number; onPage: (page: number) => void };

/** "21–40 of 300" with the previous and next pages; nothing when everything fits on one page. */
export function Pager({ label, page, pageSize, total, onPage }: Props) {
  if (total <= pageSize && page === 1) return null;
  const first = Math.min((page - 1) * pageSize + 1, total);
  const last = Math.min(page * pageSize, total);
  const pages = Math.max(1, Math.ceil(total / pageSize));
  return (
    <nav className="tr-clients-pager" aria-label={label}>
      <span className="tr-muted" aria-live="polite">
        {total === 0 ? 'None' : `${first}–${last} of ${total}`}
      </span>
      <ButtonGroup>
        <Button icon={<ChevronLeftIcon />} text="Previous" disabled={page <= 1} onClick={() => onPage(page - 1)} />
        <Button endIcon={<ChevronRightIcon />} text="Next" disabled={page >= pages} onClick={() => onPage(page + 1)} />
      </ButtonGroup>
    </nav>
  );
}
