import { useCallback, useEffect, useRef, useState } from 'react';

/**
 * An inline form opened by a button that hides while the form is open. When the form closes, the focus goes back
 * to that button (put `opener` on it), so a keyboard user carries on where they were instead of at the top of the
 * page; `closedWith` keeps what the form closed with (a saved name, `true` for a save), for a status line to announce.
 * The focus moves only after a close, never on the first render.
 */
export function useFocusReturn<Outcome>() {
  const [open, setOpen] = useState(false);
  const opener = useRef<HTMLButtonElement>(null);
  // A new object on every close, so closing twice with the same outcome still returns the focus.
  const [closed, setClosed] = useState<{ outcome: Outcome } | null>(null);
  useEffect(() => {
    if (!open && closed) opener.current?.focus();
  }, [open, closed]);
  const close = useCallback((outcome: Outcome) => {
    setOpen(false);
    setClosed({ outcome });
  }, []);
  return { open, setOpen, close, opener, closedWith: closed?.outcome };
}
