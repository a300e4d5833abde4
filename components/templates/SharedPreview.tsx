"use client";
import { useMemo, useState } from "react";
import { expandProgramme } from "@/lib/load";
import type { Programme } from "@/lib/notation/model";
import { nextMonday, SAMPLE_MAXES_KG, sampleProfile } from "../editor/sampleProfile";
import { WeekPreview } from "../preview/WeekPreview";

/** The shared version worked for the sample athlete, week by week; read-only. */
export function SharedPreview({ programme }: { programme: Programme }) {
  const [week, setWeek] = useState(1);
  const total = Math.max(1, programme.blocks.reduce((s, b) => s + b.weeks, 0));
  const start = useMemo(() => nextMonday(), []);
  const sessions = useMemo(() => {
    const { sessions } = expandProgramme(programme, sampleProfile(programme.units, programme.units === "kg" ? SAMPLE_MAXES_KG : Object.fromEntries(Object.entries(SAMPLE_MAXES_KG).map(([k, v]) => [k, Math.round(v / 0.45359237 / 5) * 5]))), { start, weeks: week });
    return sessions.filter((s) => s.weekInProgramme === week);
  }, [programme, start, week]);
  return (
    <div className="space-y-3">
      <div className="flex items-center justify-between">
        <p className="text-sm text-iron-500">Worked for a sample athlete ({programme.units}); your own maxes give your own loads.</p>
        <div className="flex items-center gap-1">
          <button type="button" className="btn-quiet px-2.5 py-1.5" onClick={() => setWeek(Math.max(1, week - 1))} disabled={week <= 1} aria-label="Previous week">‹</button>
          <span className="min-w-[6.5rem] text-center text-sm font-semibold">Week {week} of {total}</span>
          <button type="button" className="btn-quiet px-2.5 py-1.5" onClick={() => setWeek(Math.min(total, week + 1))} disabled={week >= total} aria-label="Next week">›</button>
        </div>
      </div>
      <WeekPreview sessions={sessions} />
    </div>
  );
}
