/**
 * What a screen tells a printout about itself: whether its figures are all worked out (and if not, what is
 * still coming), and the inputs they are computed from. The screen on display declares it; the shell's
 * print stamp (components/PrintStamp.tsx) puts it on paper with the program version, the time printed and
 * a fingerprint of the inputs. A screen that declares nothing prints with the version and time alone.
 */
import { createEffect, createSignal, onCleanup } from "solid-js";

export interface PrintStatus {
  /** Every figure on the screen is worked out for the inputs shown (nothing is still being computed). */
  complete: boolean;
  /** What an incomplete screen is waiting for, e.g. "the load table". */
  waitingFor: string;
  /** The inputs the figures are computed from (plain data; fingerprinted, never printed whole). */
  inputs: unknown;
}

const [status, setStatus] = createSignal<PrintStatus | null>(null);

/** The status of the screen on display, or null when it declared none. */
export const printStatus = status;

/** Declare, inside a screen component, what a printout of it needs to say; cleared when the screen goes. */
export function declarePrintStatus(get: () => PrintStatus): void {
  createEffect(() => setStatus(get()));
  onCleanup(() => setStatus(null));
}

/** Now as "YYYY-MM-DD HH:MM" in the device's time zone: when a page is printed. */
export function printStamp(now: Date = new Date()): string {
  const p = (n: number) => String(n).padStart(2, "0");
  return `${now.getFullYear()}-${p(now.getMonth() + 1)}-${p(now.getDate())} ${p(now.getHours())}:${p(now.getMinutes())}`;
}
