"use client";
import { useCallback, useEffect, useMemo, useRef } from "react";

type Pending = { key: string; text: string; at: string };

/**
 * Keeps a local copy of the draft on this device. The copy is written when the
 * browser is next idle rather than inside the keystroke (serialising a long
 * programme and writing it to storage would delay the repaint), and at once when
 * the page is hidden, left or the workbench goes away, so a closed tab still
 * loses nothing.
 */
export function useLocalDraft(draftKey: string, text: string, initialText: string): { flush(): void; forget(): void } {
  const pending = useRef<Pending | null>(null);
  const scheduled = useRef<(() => void) | null>(null);

  const flush = useCallback(() => {
    scheduled.current?.();
    scheduled.current = null;
    const p = pending.current;
    pending.current = null;
    if (!p) return;
    try {
      localStorage.setItem(p.key, JSON.stringify({ text: p.text, at: p.at }));
    } catch {
      /* full or blocked storage: the server draft still applies */
    }
  }, []);

  useEffect(() => {
    if (text === initialText) return;
    pending.current = { key: `iq-draft:${draftKey}`, text, at: new Date().toISOString() };
    if (scheduled.current) return;
    if (typeof window.requestIdleCallback === "function") {
      const id = window.requestIdleCallback(flush, { timeout: 500 });
      scheduled.current = () => window.cancelIdleCallback(id);
    } else {
      const id = window.setTimeout(flush, 200);
      scheduled.current = () => window.clearTimeout(id);
    }
  }, [text, draftKey, initialText, flush]);

  useEffect(() => {
    const onHide = () => flush();
    const onVisibility = () => document.visibilityState === "hidden" && flush();
    window.addEventListener("pagehide", onHide);
    document.addEventListener("visibilitychange", onVisibility);
    return () => {
      window.removeEventListener("pagehide", onHide);
      document.removeEventListener("visibilitychange", onVisibility);
      flush();
    };
  }, [flush]);

  const forget = useCallback(() => {
    scheduled.current?.();
    scheduled.current = null;
    pending.current = null;
    try {
      localStorage.removeItem(`iq-draft:${draftKey}`);
    } catch {
      /* nothing to clear */
    }
  }, [draftKey]);

  return useMemo(() => ({ flush, forget }), [flush, forget]);
}
