"use client";
import { type ReactNode, useEffect, useRef } from "react";

/** A drawer from the right (full width on a phone) that Escape or the backdrop closes. */
export function SidePanel({ title, onClose, children }: { title: string; onClose: () => void; children: ReactNode }) {
  const box = useRef<HTMLDivElement>(null);
  useEffect(() => {
    const key = (e: KeyboardEvent) => e.key === "Escape" && onClose();
    document.addEventListener("keydown", key);
    box.current?.querySelector<HTMLElement>("input, select, textarea, button")?.focus();
    return () => document.removeEventListener("keydown", key);
  }, [onClose]);
  return (
    <div className="fixed inset-0 z-40 flex justify-end">
      <button type="button" aria-label="Close" className="absolute inset-0 bg-iron/30" onClick={onClose} tabIndex={-1} />
      <div ref={box} role="dialog" aria-modal="true" aria-labelledby="panel-title" className="relative flex h-full w-full max-w-lg flex-col overflow-y-auto bg-white shadow-xl">
        <div className="sticky top-0 z-10 flex items-center justify-between gap-3 border-b border-chalk-200 bg-white px-5 py-4">
          <h2 id="panel-title" className="text-lg font-semibold text-iron">{title}</h2>
          <button type="button" className="btn-quiet px-3 py-1.5" onClick={onClose}>Close</button>
        </div>
        <div className="flex-1 px-5 py-5">{children}</div>
      </div>
    </div>
  );
}
