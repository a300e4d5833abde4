/**
 * Ironquill's name-plate: a pen nib cut from a bar plate, beside the word mark.
 * Drawn here so it needs no image files and prints crisply at any size.
 */
export function NibMark({ className = "h-7 w-7" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <circle cx="16" cy="16" r="15" fill="#1c2128" />
      <circle cx="16" cy="16" r="11.5" fill="none" stroke="#434b58" strokeWidth="1.5" />
      <path d="M16 5.5 L22.5 15 L16 26.5 L9.5 15 Z" fill="#c4562b" />
      <path d="M16 12.5 V24" stroke="#1c2128" strokeWidth="1.6" strokeLinecap="round" />
      <circle cx="16" cy="12.5" r="1.9" fill="#1c2128" />
    </svg>
  );
}

export function Nameplate({ subtitle }: { subtitle?: string }) {
  return (
    <span className="inline-flex items-center gap-2.5">
      <NibMark />
      <span className="flex flex-col leading-none">
        <span className="text-lg font-bold tracking-tight text-iron">
          Iron<span className="text-ember">quill</span>
        </span>
        {subtitle ? <span className="mt-0.5 text-[11px] font-medium uppercase tracking-[0.14em] text-iron-400">{subtitle}</span> : null}
      </span>
    </span>
  );
}
