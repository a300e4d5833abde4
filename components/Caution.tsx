/** The caution every screen and card that shows a load carries. */
export const CAUTION_TEXT =
  "Loads are estimates from the maxes on file. Warm up first, stop on pain or a rep that breaks form, and check with a qualified coach or health professional; local rules and licensed advice come first.";

export function Caution({ className = "" }: { className?: string }) {
  return (
    <p role="note" className={`rounded-md border border-brass-500/40 bg-brass-100/60 px-3 py-2 text-xs leading-relaxed text-iron-700 ${className}`}>
      <span className="font-semibold">Train safe. </span>
      {CAUTION_TEXT}
    </p>
  );
}
