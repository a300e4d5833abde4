import type { AssignOutcome } from "@/app/api/assignments/types";
import { dayLabel } from "./dates";

/** Per athlete: assigned with how many sessions and any notes from working out the loads, or why not. */
export function OutcomeList({ outcomes }: { outcomes: AssignOutcome[] }) {
  if (outcomes.length === 0) return null;
  return (
    <ul className="divide-y divide-chalk-200 text-sm" data-testid="assign-outcomes">
      {outcomes.map((o) => (
        <li key={o.athleteId} className="py-2">
          {o.status === "assigned" ? (
            <>
              <p>
                <span className="font-medium">{o.athleteName}</span>{" "}
                <span className="text-moss-700">
                  assigned — {o.sessions} session{o.sessions === 1 ? "" : "s"}
                  {o.firstDate ? `, first on ${dayLabel(o.firstDate)}` : ""}
                </span>
              </p>
              {o.diagnostics.length > 0 ? (
                <ul className="mt-1 list-disc space-y-0.5 pl-5 text-iron-500">
                  {o.diagnostics.map((d, i) => (
                    <li key={i}>
                      {d.message}
                      {d.line !== null ? <span className="text-iron-300"> (line {d.line})</span> : null}
                    </li>
                  ))}
                </ul>
              ) : null}
            </>
          ) : (
            <p>
              <span className="font-medium">{o.athleteName ?? "An athlete"}</span> <span className="text-ember-700">not assigned: {o.error.message}</span>
            </p>
          )}
        </li>
      ))}
    </ul>
  );
}
