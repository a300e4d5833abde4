"use client";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import { api, ApiFailure } from "@/components/templates/api";
import { startingValues, variantOf } from "./plan";
import { clientNow, entryTime, exerciseKeyOf, readQueue, setKey, writeQueue, type Queue, type QueueEntry } from "./queue";
import type { LogSheet, SetLog, SetValues, Summary } from "./types";
import { useOnline } from "./useOnline";

/** Network trouble and server hiccups are worth another try; a refused value is not. */
function retryable(err: unknown): boolean {
  return !(err instanceof ApiFailure) || err.status === 0 || err.status === 429 || err.status >= 500;
}

const RETRIES = 3;
const FLUSH_DELAY_MS = 300;
const RETRY_EVERY_MS = 15_000;

function withSet(sheet: LogSheet, set: SetLog): LogSheet {
  const rest = sheet.sets.filter((s) => !(s.exerciseIndex === set.exerciseIndex && s.setIndex === set.setIndex));
  return { ...sheet, sets: [...rest, set].sort((a, b) => a.exerciseIndex - b.exerciseIndex || a.setIndex - b.setIndex) };
}

function optimisticSet(sheet: LogSheet, body: Extract<QueueEntry, { kind: "set" }>["body"]): SetLog {
  const ex = sheet.session.plan.exercises[body.exerciseIndex];
  const variant = variantOf(ex, body.exercise);
  const planned = variant.sets[body.setIndex];
  return {
    exerciseIndex: body.exerciseIndex,
    setIndex: body.setIndex,
    kind: planned?.kind ?? "work",
    exercise: variant.name,
    exerciseKey: variant.name,
    plannedExercise: ex.name,
    plannedReps: planned?.repsMin ?? null,
    plannedLoad: planned?.load ?? null,
    reps: body.reps,
    load: body.load,
    unit: sheet.session.units,
    rir: body.rir,
    done: body.done,
    clientTime: body.clientTime,
  };
}

/**
 * The logging screen's data: the sheet from the server (TanStack Query, with
 * optimistic updates), the queue of changes not yet saved (localStorage),
 * and the sending of that queue with retries and backoff — now, on
 * reconnect, and every few seconds while anything waits.
 */
export function useLogSync(initial: LogSheet) {
  const sessionId = initial.session.id;
  const queryKey = useMemo(() => ["log", sessionId], [sessionId]);
  const client = useQueryClient();
  const online = useOnline();
  const sheet = useQuery({
    queryKey,
    queryFn: () => api<{ sheet: LogSheet }>(`/api/sessions/${sessionId}/log`).then((r) => r.sheet),
    initialData: initial,
    staleTime: 60_000,
  }).data;

  const [queue, setQueue] = useState<Queue>({});
  const queueRef = useRef<Queue>({});
  const inFlight = useRef(new Set<string>());
  const [trouble, setTrouble] = useState(false);

  const updateQueue = useCallback(
    (fn: (q: Queue) => Queue) => {
      const next = fn(queueRef.current);
      queueRef.current = next;
      writeQueue(sessionId, next);
      setQueue(next);
    },
    [sessionId],
  );

  const send = useMutation({
    mutationFn: async (entry: QueueEntry) => {
      if (entry.kind === "set") {
        const r = await api<{ set: SetLog; stale: boolean }>(`/api/sessions/${sessionId}/log/sets`, { method: "PUT", json: entry.body });
        return { entry, set: r.set };
      }
      await api(`/api/sessions/${sessionId}/log/exercises`, { method: "PUT", json: entry.body });
      return { entry, set: null };
    },
    networkMode: "always",
    retry: (count, err) => retryable(err) && count < RETRIES,
    retryDelay: (attempt) => Math.min(1000 * 2 ** attempt, 10_000),
    onMutate: async (entry) => {
      await client.cancelQueries({ queryKey });
      if (entry.kind !== "set") return { previous: undefined };
      const before = client.getQueryData<LogSheet>(queryKey);
      const previous = before?.sets.find((s) => s.exerciseIndex === entry.body.exerciseIndex && s.setIndex === entry.body.setIndex);
      client.setQueryData<LogSheet>(queryKey, (old) => (old ? withSet(old, optimisticSet(old, entry.body)) : old));
      return { previous };
    },
    onSuccess: ({ entry, set }) => {
      setTrouble(false);
      if (set) client.setQueryData<LogSheet>(queryKey, (old) => (old ? withSet(old, set) : old));
      if (entry.kind === "exercise") {
        // Written into the cache before the queue entry goes, so the swap never flickers back.
        const { exerciseIndex, exercise, note } = entry.body;
        client.setQueryData<LogSheet>(queryKey, (old) => {
          if (!old) return old;
          const prev = old.exercises.find((e) => e.exerciseIndex === exerciseIndex);
          const next = { exerciseIndex, exercise: exercise ?? prev?.exercise ?? old.session.plan.exercises[exerciseIndex].name, note: note === undefined ? (prev?.note ?? null) : note };
          return { ...old, exercises: [...old.exercises.filter((e) => e.exerciseIndex !== exerciseIndex), next] };
        });
        void client.invalidateQueries({ queryKey });
      }
      updateQueue((q) => {
        const current = q[entry.key];
        if (!current || entryTime(current) !== entryTime(entry)) return q;
        const { [entry.key]: _sent, ...rest } = q;
        return rest;
      });
    },
    onError: (err, entry, context) => {
      if (retryable(err)) {
        setTrouble(true);
        return;
      }
      // The saved copy goes back to what the server has; the refused values stay visible through the queue entry.
      if (entry.kind === "set") {
        const { exerciseIndex, setIndex } = entry.body;
        client.setQueryData<LogSheet>(queryKey, (old) => {
          if (!old) return old;
          if (context?.previous) return withSet(old, context.previous);
          return { ...old, sets: old.sets.filter((s) => !(s.exerciseIndex === exerciseIndex && s.setIndex === setIndex)) };
        });
      }
      // Refused by the server: keep the athlete's values on screen with the reason, never drop them.
      const message = err instanceof ApiFailure ? (Object.values(err.error.fields)[0] ?? err.error.message) : "Could not save this";
      updateQueue((q) => (q[entry.key] && entryTime(q[entry.key]) === entryTime(entry) ? { ...q, [entry.key]: { ...q[entry.key], error: message } } : q));
    },
    onSettled: (_data, _err, entry) => {
      inFlight.current.delete(entry.key);
      const current = queueRef.current[entry.key];
      if (current && !current.error && entryTime(current) !== entryTime(entry)) schedule();
    },
  });
  const mutate = send.mutate;

  const flush = useCallback(() => {
    if (typeof navigator !== "undefined" && !navigator.onLine) return;
    for (const entry of Object.values(queueRef.current)) {
      if (entry.error || inFlight.current.has(entry.key)) continue;
      inFlight.current.add(entry.key);
      mutate(entry);
    }
  }, [mutate]);

  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const schedule = useCallback(() => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = setTimeout(flush, FLUSH_DELAY_MS);
  }, [flush]);

  // Whatever an earlier visit left unsaved goes first.
  useEffect(() => {
    queueRef.current = readQueue(sessionId);
    setQueue(queueRef.current);
    schedule();
  }, [sessionId, schedule]);

  useEffect(() => {
    if (online) schedule();
  }, [online, schedule]);

  const pending = Object.values(queue).filter((e) => !e.error).length;
  useEffect(() => {
    if (pending === 0) return;
    const id = setInterval(flush, RETRY_EVERY_MS);
    return () => clearInterval(id);
  }, [pending, flush]);

  const chosenExercise = useCallback(
    (index: number): string => {
      const queued = queue[exerciseKeyOf(index)];
      if (queued?.kind === "exercise" && queued.body.exercise) return queued.body.exercise;
      const stored = sheet.exercises.find((e) => e.exerciseIndex === index)?.exercise;
      if (stored) return stored;
      const done = sheet.sets.find((s) => s.exerciseIndex === index && s.done);
      return done?.exercise ?? sheet.session.plan.exercises[index].name;
    },
    [queue, sheet],
  );

  const noteOf = useCallback(
    (index: number): string => {
      const queued = queue[exerciseKeyOf(index)];
      if (queued?.kind === "exercise" && queued.body.note !== undefined) return queued.body.note ?? "";
      return sheet.exercises.find((e) => e.exerciseIndex === index)?.note ?? "";
    },
    [queue, sheet],
  );

  /** What the athlete sees for a set: a waiting change, else the saved one, else the plan. */
  const valuesOf = useCallback(
    (index: number, setIndex: number): { values: SetValues; state: "saved" | "pending" | "error" | "plan"; error: string | null } => {
      const queued = queue[setKey(index, setIndex)];
      if (queued?.kind === "set") {
        const { reps, load, rir, done } = queued.body;
        return { values: { reps, load, rir, done }, state: queued.error ? "error" : "pending", error: queued.error };
      }
      const name = chosenExercise(index);
      const saved = sheet.sets.find((s) => s.exerciseIndex === index && s.setIndex === setIndex && variantOf(sheet.session.plan.exercises[index], s.exercise).name === variantOf(sheet.session.plan.exercises[index], name).name);
      if (saved) return { values: { reps: saved.reps, load: saved.load, rir: saved.rir, done: saved.done }, state: "saved", error: null };
      const planned = variantOf(sheet.session.plan.exercises[index], name).sets[setIndex];
      return { values: planned ? startingValues(planned) : { reps: 0, load: 0, rir: null, done: false }, state: "plan", error: null };
    },
    [queue, sheet, chosenExercise],
  );

  const saveSet = useCallback(
    (index: number, setIndex: number, values: SetValues) => {
      const key = setKey(index, setIndex);
      const body = { exerciseIndex: index, setIndex, exercise: chosenExercise(index), ...values, clientId: `${sessionId}:${key}`, clientTime: clientNow() };
      updateQueue((q) => ({ ...q, [key]: { key, kind: "set", body, error: null } }));
      schedule();
    },
    [chosenExercise, schedule, sessionId, updateQueue],
  );

  const saveExercise = useCallback(
    (index: number, patch: { exercise?: string; note?: string | null }) => {
      const key = exerciseKeyOf(index);
      updateQueue((q) => {
        const prev = q[key];
        const body = { ...(prev?.kind === "exercise" ? prev.body : {}), ...patch, exerciseIndex: index };
        return { ...q, [key]: { key, kind: "exercise", body, clientTime: clientNow(), error: null } };
      });
      schedule();
    },
    [schedule, updateQueue],
  );

  const retry = useCallback(
    (key: string) => {
      updateQueue((q) => (q[key] ? { ...q, [key]: { ...q[key], error: null } } : q));
      schedule();
    },
    [schedule, updateQueue],
  );

  const discard = useCallback((key: string) => updateQueue(({ [key]: _gone, ...rest }) => rest), [updateQueue]);

  const finish = useMutation({
    mutationFn: () => api<{ completedAt: string; proposals: number; summary: Summary }>(`/api/sessions/${sessionId}/log/finish`, { method: "POST" }),
    onSuccess: (r) => client.setQueryData<LogSheet>(queryKey, (old) => (old ? { ...old, session: { ...old.session, completedAt: r.completedAt } } : old)),
  });

  const failed = Object.values(queue).filter((e) => e.error);
  return { sheet, online, pending, failed, trouble, valuesOf, chosenExercise, noteOf, saveSet, saveExercise, retry, discard, finish, flush };
}

export type LogSync = ReturnType<typeof useLogSync>;
