import { Spinner } from '@blueprintjs/core';

/** Shown while the app asks the server whether this browser is still signed in. */
export function AppLoading() {
  return (
    <div className="tr-app-loading">
      <Spinner size={32} aria-label="Opening Tressury" />
    </div>
  );
}
