import { OverlayToaster, Position, type Toaster, type ToastProps } from '@blueprintjs/core';

let toaster: Promise<Toaster> | undefined;

/** The app's one toaster, created on first use. */
export async function showToast(toast: ToastProps): Promise<void> {
  toaster ??= OverlayToaster.create({ position: Position.TOP, maxToasts: 3 });
  (await toaster).show(toast);
}

/** Dismisses every toast on screen (tests call it between cases so no toast timer outlives its page). */
export async function dismissAllToasts(): Promise<void> {
  if (toaster) (await toaster).clear();
}
