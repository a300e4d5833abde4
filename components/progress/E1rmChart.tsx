"use client";
import { useState } from "react";
import { CartesianGrid, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { ExerciseProgress } from "@/db/progress";

const SHORT = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", timeZone: "UTC" });
const short = (d: string) => SHORT.format(new Date(`${d}T00:00:00Z`));
const fmt = (n: number) => (Number.isInteger(n) ? String(n) : n.toFixed(1));

type Point = ExerciseProgress["points"][number];

function PbDot(props: { cx?: number; cy?: number; payload?: Point; index?: number }) {
  const { cx, cy, payload, index } = props;
  if (cx === undefined || cy === undefined) return <g key={index} />;
  return payload?.pb ? (
    <g key={index}>
      <circle cx={cx} cy={cy} r={7} fill="#b8892b" stroke="#fff" strokeWidth={2} />
    </g>
  ) : (
    <circle key={index} cx={cx} cy={cy} r={3.5} fill="#c4562b" />
  );
}

/** Estimated 1RM of one exercise over time (best set per session); personal bests are the gold dots. */
export function E1rmChart({ exercises, units }: { exercises: ExerciseProgress[]; units: string }) {
  const [key, setKey] = useState(exercises[0]?.key ?? "");
  const ex = exercises.find((e) => e.key === key) ?? exercises[0];
  if (!ex) return null;
  const values = ex.points.map((p) => p.e1rm);
  const lo = Math.floor(Math.min(...values) * 0.95);
  const hi = Math.ceil(Math.max(...values) * 1.03);
  return (
    <div data-testid="e1rm-chart">
      <label className="block">
        <span className="sr-only">Exercise</span>
        <select className="field-input mt-0 h-12" value={ex.key} onChange={(e) => setKey(e.target.value)} aria-label="Exercise for the estimated 1RM chart">
          {exercises.map((e) => (
            <option key={e.key} value={e.key}>
              {e.name} ({e.points.length} session{e.points.length === 1 ? "" : "s"})
            </option>
          ))}
        </select>
      </label>
      <div className="mt-2 flex flex-wrap items-baseline gap-x-4 gap-y-1 text-sm">
        {ex.best ? (
          <span>
            Best <strong className="font-mono">{fmt(ex.best.e1rm)} {units}</strong> <span className="text-iron-400">on {short(ex.best.date)}</span>
          </span>
        ) : null}
        <span className="text-iron-500">
          Latest <span className="font-mono">{fmt(ex.points[ex.points.length - 1].e1rm)} {units}</span>
        </span>
      </div>
      {ex.points.length < 2 ? (
        <p className="mt-3 rounded-lg bg-chalk-100 px-3 py-6 text-center text-sm text-iron-500">One session so far. The line starts with the next one.</p>
      ) : (
        <div className="mt-2 h-56 w-full">
          <ResponsiveContainer width="100%" height="100%" initialDimension={{ width: 300, height: 224 }}>
            <LineChart data={ex.points} margin={{ top: 10, right: 10, bottom: 0, left: -12 }}>
              <CartesianGrid stroke="#e9e5dc" vertical={false} />
              <XAxis dataKey="date" tickFormatter={short} tick={{ fontSize: 11, fill: "#5b6472" }} minTickGap={24} />
              <YAxis domain={[lo, hi]} tick={{ fontSize: 11, fill: "#5b6472" }} width={48} />
              <Tooltip
                formatter={(v) => [`${fmt(Number(v))} ${units}`, "e1RM"]}
                labelFormatter={(d) => short(String(d))}
                contentStyle={{ borderRadius: 8, borderColor: "#d8d2c5", fontSize: 12 }}
              />
              <Line type="monotone" dataKey="e1rm" stroke="#c4562b" strokeWidth={2.5} dot={PbDot} activeDot={{ r: 6 }} isAnimationActive={false} />
            </LineChart>
          </ResponsiveContainer>
        </div>
      )}
      <p className="mt-1 text-xs text-iron-400">
        <span className="mr-1 inline-block h-2.5 w-2.5 rounded-full bg-brass-500 align-middle" /> personal best · estimated from the best set of each session
      </p>
    </div>
  );
}
