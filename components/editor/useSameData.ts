"use client";
import { useRef } from "react";
import { sameData } from "../preview/sameData";

/**
 * The previous value while a recomputed one is equal to it, so memoised children
 * fed from derived lists (problems, names) skip rendering when nothing changed.
 */
export function useSameData<T>(value: T): T {
  const last = useRef(value);
  // Rendering twice with the same input keeps the same answer, so this is safe to redo.
  if (!sameData(last.current, value)) last.current = value;
  return last.current;
}
