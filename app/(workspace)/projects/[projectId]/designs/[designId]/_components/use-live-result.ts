"use client";

import { useEffect, useRef, useState } from "react";
import { designInputSchema, type DesignResult } from "@/engine";

export type LiveStatus = "saved" | "waiting" | "loading" | "fresh" | "invalid" | "error";

/**
 * Results that follow the form: 300 ms after the last change, posts the input to /api/calc; a newer
 * change aborts the request still in flight, so an old answer never overwrites a newer one. While
 * the form has errors nothing is sent and the last good result stays on screen, marked as such.
 */
export function useLiveResult(values: unknown, initial: DesignResult, initialKey: string, onFieldErrors: (errors: { path: string; message: string }[]) => void) {
  const [result, setResult] = useState(initial);
  const [status, setStatus] = useState<LiveStatus>("saved");
  const [message, setMessage] = useState("");
  const inFlight = useRef<AbortController | null>(null);
  const key = JSON.stringify(values);

  useEffect(() => {
    if (key === initialKey) return;
    const parsed = designInputSchema.safeParse(values);
    if (!parsed.success) {
      inFlight.current?.abort();
      setStatus("invalid");
      setMessage(`${parsed.error.issues.length === 1 ? "1 field needs" : `${parsed.error.issues.length} fields need`} fixing before results can update.`);
      return;
    }
    setStatus("waiting");
    const timer = setTimeout(async () => {
      inFlight.current?.abort();
      const controller = new AbortController();
      inFlight.current = controller;
      setStatus("loading");
      try {
        const response = await fetch("/api/calc", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(parsed.data), signal: controller.signal });
        const json = await response.json();
        if (controller.signal.aborted) return;
        if (response.ok) {
          setResult(json.result);
          setStatus("fresh");
          setMessage("");
        } else if (response.status === 422) {
          onFieldErrors(json.errors);
          setStatus("invalid");
          setMessage(json.errors.map((e: { message: string }) => e.message).join(" "));
        } else {
          setStatus("error");
          setMessage(json.errors?.[0]?.message ?? "The calculation did not answer; results shown are from before your last change.");
        }
      } catch (error) {
        if ((error as Error).name === "AbortError") return;
        setStatus("error");
        setMessage("Could not reach the server; results shown are from before your last change.");
      }
    }, 300);
    return () => clearTimeout(timer);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [key]);

  useEffect(() => () => inFlight.current?.abort(), []);
  return { result, status, message };
}
