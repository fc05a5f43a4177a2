"use client";

import { useEffect, useRef } from "react";

/** Opens the native <dialog> as a modal while `open` holds (focus trap, Escape, focus returned). */
export function useModal(open: boolean) {
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);
  return ref;
}
