// Keystroke → results painted, measured in the page for the browser test and `npm run bench`.
// Each edit made during a user event (a keystroke, a pick, a click) is queued with the event's
// own timestamp; once the results panel has been rendered from that document (or a later one)
// and the browser has painted it, the time from the event to after that paint is pushed to
// `window.__warmsteadTimings` (ms). Edits made outside an event (loading, derived updates) are
// not counted on their own; a derived edit inside the same event extends that event's entry.
import type { AssessmentDoc } from "@/lib/assessment/doc";

declare global {
  interface Window {
    /** Milliseconds from each edit's input event to the first paint of results that reflect it. */
    __warmsteadTimings?: number[];
  }
}

const USER_EVENTS = new Set(["input", "change", "click", "keydown", "keyup", "keypress", "pointerdown", "pointerup", "mousedown", "mouseup", "paste", "cut", "drop", "submit"]);

type Pending = { doc: AssessmentDoc; at: number; event: Event };
const queue: Pending[] = [];

/** Call with the document an edit produced, while the edit's event is being handled. */
export function noteEdit(doc: AssessmentDoc) {
  const current = typeof window === "undefined" ? undefined : window.event;
  // Only a person's input counts; scheduler tasks (message events) and timers run derived edits.
  const event = current && USER_EVENTS.has(current.type) ? current : undefined;
  if (!event) {
    // A derived edit outside any event (e.g. a price refresh): the latest pending entry now waits for it.
    const last = queue.at(-1);
    if (last) last.doc = doc;
    return;
  }
  const last = queue.at(-1);
  if (last && last.event === event) last.doc = doc;
  else queue.push({ doc, at: event.timeStamp, event });
}

/** Call after committing results computed from `doc`: every edit up to it is measured after the next paint. */
export function noteResults(doc: AssessmentDoc) {
  const i = queue.findIndex((p) => p.doc === doc);
  if (i < 0) return;
  const done = queue.splice(0, i + 1);
  requestAnimationFrame(() => {
    // rAF runs before the frame is painted; a message posted from it is handled after the paint.
    const ch = new MessageChannel();
    ch.port1.onmessage = () => {
      const now = performance.now();
      (window.__warmsteadTimings ??= []).push(...done.map((p) => now - p.at));
      ch.port1.close();
    };
    ch.port2.postMessage(null);
  });
}
