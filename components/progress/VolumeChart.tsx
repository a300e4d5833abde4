"use client";
import { Bar, BarChart, CartesianGrid, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { WeekVolume } from "@/lib/progress/volume";

const SHORT = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", timeZone: "UTC" });
const compact = (n: number) => (n >= 10_000 ? `${Math.round(n / 1000)}k` : n >= 1000 ? `${(n / 1000).toFixed(1)}k` : String(Math.round(n)));

/** Volume load (reps × load of work sets) per ISO week. */
export function VolumeChart({ weeks, units }: { weeks: WeekVolume[]; units: string }) {
  if (weeks.length === 0) return null;
  const data = weeks.map((w) => ({ ...w, label: SHORT.format(new Date(`${w.monday}T00:00:00Z`)) }));
  return (
    <div className="h-48 w-full" data-testid="volume-chart">
      <ResponsiveContainer width="100%" height="100%" initialDimension={{ width: 300, height: 192 }}>
        <BarChart data={data} margin={{ top: 10, right: 8, bottom: 0, left: -12 }}>
          <CartesianGrid stroke="#e9e5dc" vertical={false} />
          <XAxis dataKey="label" tick={{ fontSize: 11, fill: "#5b6472" }} minTickGap={12} />
          <YAxis tickFormatter={compact} tick={{ fontSize: 11, fill: "#5b6472" }} width={44} />
          <Tooltip
            formatter={(v) => [`${Number(v).toLocaleString("en-GB")} ${units}`, "volume"]}
            labelFormatter={(_l, p) => {
              const w = p?.[0]?.payload as (WeekVolume & { label: string }) | undefined;
              return w ? `${w.week} · ${w.sets} sets, ${w.reps} reps` : "";
            }}
            contentStyle={{ borderRadius: 8, borderColor: "#d8d2c5", fontSize: 12 }}
          />
          <Bar dataKey="volume" fill="#2f6f5e" radius={[4, 4, 0, 0]} isAnimationActive={false} />
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
}
