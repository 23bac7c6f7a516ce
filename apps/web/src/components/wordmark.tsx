export function Wordmark() {
  return (
    <span className="tr-wordmark">
      <svg className="tr-wordmark-mark" viewBox="0 0 24 24" width="22" height="22" aria-hidden="true" focusable="false">
        <circle cx="12" cy="12" r="10.5" fill="none" stroke="currentColor" strokeWidth="1.6" />
        <path d="M8 5.5c3 2.2 3 4.4 0 6.5s-3 4.4 0 6.5M12 4.5c3 2.4 3 4.8 0 7.5s-3 4.8 0 7.5M16 5.5c3 2.2 3 4.4 0 6.5s-3 4.4 0 6.5" fill="none" stroke="currentColor" strokeWidth="1.4" strokeLinecap="round" />
      </svg>
      Tressury
    </span>
  );
}
