"use client";

import { useEffect, useState } from "react";
import { checkWall } from "@/calc/crew-check";
import type { CrewLogView, WallView } from "@/lib/data/crew-log";
import type { QueuedRequest } from "@/lib/hooks/use-crew-log";
import { CREW_LIMITS } from "@/lib/validation/crew-log";
import { bagsText, intText, whenText } from "./format";
import { Stepper } from "./stepper";

// The crew's words for the checks (the same as the API's).
const OVER_TITLE = "Material may be escaping into an attic, chase, soffit or basement — stop and look.";
const UNDER_TITLE = "Possible voids or low density — probe or re-blow.";

type Draft = { bags: string; holes: string; blocked: string; prefilled: string; note: string; resolution: string; finished: boolean | null };
const emptyDraft: Draft = { bags: "0", holes: "0", blocked: "0", prefilled: "0", note: "", resolution: "", finished: null };
const draftKey = (jobId: string, surfaceId: string) => `warmstead:crew-draft:${jobId}:${surfaceId}`;

function readDraft(jobId: string, surfaceId: string): Draft {
  try {
    const raw = localStorage.getItem(draftKey(jobId, surfaceId));
    return raw ? { ...emptyDraft, ...(JSON.parse(raw) as Partial<Draft>) } : emptyDraft;
  } catch {
    return emptyDraft;
  }
}

function numberOrError(text: string, label: string, max: number, int: boolean): [number, string | undefined] {
  const t = text.trim();
  if (t === "") return [0, undefined];
  const n = Number(t);
  if (!Number.isFinite(n)) return [0, `${label} must be a number.`];
  if (n < 0 || n > max) return [0, `${label} must be between 0 and ${max.toLocaleString("en-US")}.`];
  if (int && !Number.isInteger(n)) return [0, `${label} must be a whole number.`];
  if (!int && Math.abs(n * 100 - Math.round(n * 100)) > 1e-6) return [0, `${label} can have at most two decimals.`];
  return [n, undefined];
}

type Props = {
  jobId: string;
  wall: WallView;
  thresholds: CrewLogView["thresholds"];
  queued: QueuedRequest[];
  canWrite: boolean;
  onSave?: (body: Record<string, unknown>) => void;
  onDiscard?: (clientRequestId: string) => void;
};

export function WallCard({ jobId, wall, thresholds, queued, canWrite, onSave, onDiscard }: Props) {
  const [draft, setDraft] = useState<Draft>(emptyDraft);
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});
  useEffect(() => {
    // The draft typed before a reload comes back from this phone.
    // eslint-disable-next-line react-hooks/set-state-in-effect
    if (canWrite) setDraft(readDraft(jobId, wall.surfaceId));
  }, [jobId, wall.surfaceId, canWrite]);
  const change = (patch: Partial<Draft>) =>
    setDraft((d) => {
      const next = { ...d, ...patch };
      try {
        localStorage.setItem(draftKey(jobId, wall.surfaceId), JSON.stringify(next));
      } catch {
        // storage blocked: the draft lives in memory only
      }
      return next;
    });

  const mine = queued.filter((q) => q.kind === "entry" && q.body.surfaceId === wall.surfaceId);
  const pending = mine.filter((q) => q.state === "pending");
  const rejected = mine.filter((q) => q.state === "rejected");
  // Sent but not yet in the log read back: still counted, so the tally never dips.
  const inFlight = mine.filter((q) => q.state !== "rejected" && !wall.entries.some((e) => e.clientRequestId === q.clientRequestId));
  const pendingBags = inFlight.reduce((a, q) => a + Number(q.body.bagsBlown ?? 0), 0);
  const pendingHoles = inFlight.reduce((a, q) => a + Number(q.body.holesDrilled ?? 0), 0);
  const lastPendingFinished = inFlight.length ? Boolean(inFlight[inFlight.length - 1]!.body.finished) : null;

  // Logged on the server plus what waits on this phone: the tally the crew is actually at.
  const bags = Math.round((wall.logged.bags + pendingBags) * 100) / 100;
  const holes = wall.logged.holes + pendingHoles;
  const finished = lastPendingFinished ?? wall.finished;
  const check = checkWall(wall.surfaceId, wall.name, wall.expected.bags, bags, thresholds.high, thresholds.low);
  const over = check.status === "possible-bypass";
  const under = finished && check.status === "possible-voids-or-low-density";

  const [draftBags, bagsError] = numberOrError(draft.bags, "Bags blown", CREW_LIMITS.bags, false);
  const [draftHoles, holesError] = numberOrError(draft.holes, "Holes drilled", CREW_LIMITS.holes, true);
  const [draftBlocked, blockedError] = numberOrError(draft.blocked, "Blocked bays", CREW_LIMITS.bays, true);
  const [draftPrefilled, prefilledError] = numberOrError(draft.prefilled, "Pre-filled bays", CREW_LIMITS.bays, true);
  const draftFinished = draft.finished ?? finished;
  const after = checkWall(wall.surfaceId, wall.name, wall.expected.bags, Math.round((bags + draftBags) * 100) / 100, thresholds.high, thresholds.low);
  const previewOver = !over && after.status === "possible-bypass";
  const previewUnder = !under && draftFinished && after.status === "possible-voids-or-low-density";
  const openWarning = over || under || wall.warnings.some((w) => w.state === "open");

  const pct = wall.expected.bags > 0 ? Math.min(100, (bags / (wall.expected.bags * thresholds.high)) * 100) : 0;
  const expectedMark = (1 / thresholds.high) * 100;

  const save = () => {
    const errors = Object.fromEntries(
      ([["bagsBlown", bagsError], ["holesDrilled", holesError], ["blockedBays", blockedError], ["prefilledBays", prefilledError]] as const).filter(([, e]) => e),
    ) as Record<string, string>;
    if (draft.note.length > CREW_LIMITS.note) errors.note = `Note must be at most ${CREW_LIMITS.note} characters.`;
    if (draft.resolution.length > CREW_LIMITS.note) errors.resolution = `Resolution must be at most ${CREW_LIMITS.note} characters.`;
    setFieldErrors(errors);
    if (Object.keys(errors).length) return;
    onSave?.({
      surfaceId: wall.surfaceId, bagsBlown: draftBags, holesDrilled: draftHoles, blockedBays: draftBlocked, prefilledBays: draftPrefilled,
      note: draft.note.trim() || undefined, resolution: draft.resolution.trim() || undefined, finished: draftFinished, loggedAt: Date.now(),
    });
    change({ ...emptyDraft });
  };

  const nothingToSave = draftBags === 0 && draftHoles === 0 && draftBlocked === 0 && draftPrefilled === 0 && !draft.note.trim() && !draft.resolution.trim() && draftFinished === finished;

  return (
    <section className="rounded-lg border border-line bg-white p-4 shadow-sm" aria-labelledby={`wall-${wall.surfaceId}`} data-testid="wall-card" data-wall={wall.name}>
      <div className="flex items-start justify-between gap-3">
        <h2 id={`wall-${wall.surfaceId}`} className="text-xl font-bold text-spruce-900">{wall.name}</h2>
        {finished ? <span className="rounded-full bg-spruce-700 px-3 py-1 text-sm font-semibold text-white">Finished</span> : bags === 0 && wall.entries.length === 0 && inFlight.length === 0 ? <span className="rounded-full bg-paper-deep px-3 py-1 text-sm font-semibold text-charcoal">Not started</span> : <span className="rounded-full bg-ember-100 px-3 py-1 text-sm font-semibold text-ember-700">In progress</span>}
      </div>
      <p className="mt-1 text-ink-muted">
        Expected about <strong className="text-charcoal">{bagsText(wall.expected.bags)} bags</strong> · {intText(wall.expected.holes)} holes · {intText(wall.expected.bays)} bays
        {wall.expected.blockedBays ? ` (${intText(wall.expected.blockedBays)} blocked)` : ""}
      </p>

      <div className="sticky top-0 z-10 -mx-4 mt-3 border-y border-line bg-paper px-4 py-3" data-testid="wall-tally">
        <div className="flex items-end justify-between gap-3">
          <p>
            <span className="block text-sm font-semibold text-ink-muted">Bags blown</span>
            <span className="text-4xl font-bold tabular-nums text-spruce-900" data-testid="tally-bags">{bagsText(bags)}</span>
            <span className="text-xl text-ink-muted"> / {bagsText(wall.expected.bags)}</span>
          </p>
          <p className="text-right">
            <span className="block text-sm font-semibold text-ink-muted">Holes</span>
            <span className="text-2xl font-bold tabular-nums">{intText(holes)}</span>
            <span className="text-ink-muted"> / {intText(wall.expected.holes)}</span>
          </p>
        </div>
        <div className="relative mt-2 h-3 overflow-hidden rounded-full bg-paper-deep" aria-hidden>
          <div className={`h-full ${over ? "bg-danger" : "bg-spruce-600"}`} style={{ width: `${pct}%` }} />
          <div className="absolute inset-y-0 w-0.5 bg-charcoal" style={{ left: `${expectedMark}%` }} />
        </div>
        <p className="mt-1 text-sm text-ink-muted">
          {check.ratio !== null ? `${check.ratio.toFixed(2)}× expected` : "No estimate"} · warning above {thresholds.high}× or, once finished, below {thresholds.low}×
          {pending.length ? <span className="ml-1 font-semibold text-warn" data-testid="wall-pending"> · {pending.length} pending on this phone</span> : null}
        </p>
      </div>

      {over || under ? (
        <div role="alert" className="mt-3 rounded-md border-2 border-danger bg-danger-bg p-3" data-testid={over ? "overfill-warning" : "underfill-warning"}>
          <p className="text-lg font-bold text-danger">{over ? OVER_TITLE : UNDER_TITLE}</p>
          <p className="mt-1 text-charcoal">{check.message}</p>
        </div>
      ) : null}

      {wall.warnings.length ? (
        <ul className="mt-3 space-y-1 text-sm" aria-label="Warnings on this wall">
          {wall.warnings.map((w) => (
            <li key={w.raisedByEntryId + w.kind} className="rounded-md bg-paper-deep px-3 py-2">
              <strong>{w.kind === "overfill" ? "Overfill" : "Underfill"}</strong> at {bagsText(w.bagsAtRaise)} bags, {whenText(w.raisedAt)} —{" "}
              {w.state === "resolved" ? <>resolved by {w.resolution!.by}: “{w.resolution!.note}”</> : w.state === "cleared" ? "back within range" : <span className="font-semibold text-danger">open</span>}
            </li>
          ))}
        </ul>
      ) : null}

      {canWrite ? (
        <div className="mt-4 space-y-3" data-testid="wall-form">
          <Stepper label="Bags blown (this entry)" value={draft.bags} onChange={(bags) => change({ bags })} steps={[0.5, 1]} decimals max={CREW_LIMITS.bags} error={fieldErrors.bagsBlown ?? bagsError} testId="stepper-bags" />
          <Stepper label="Holes drilled (this entry)" value={draft.holes} onChange={(holes) => change({ holes })} steps={[1, 5]} max={CREW_LIMITS.holes} error={fieldErrors.holesDrilled ?? holesError} testId="stepper-holes" />
          <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
            <Stepper label="Blocked bays" value={draft.blocked} onChange={(blocked) => change({ blocked })} steps={[1]} max={CREW_LIMITS.bays} error={fieldErrors.blockedBays ?? blockedError} />
            <Stepper label="Pre-filled bays" value={draft.prefilled} onChange={(prefilled) => change({ prefilled })} steps={[1]} max={CREW_LIMITS.bays} error={fieldErrors.prefilledBays ?? prefilledError} />
          </div>
          <div>
            <label htmlFor={`note-${wall.surfaceId}`} className="field-label">Note (optional)</label>
            <textarea id={`note-${wall.surfaceId}`} className="field-input min-h-20" value={draft.note} onChange={(e) => change({ note: e.target.value })} maxLength={CREW_LIMITS.note} />
            <p className="field-error">{fieldErrors.note}</p>
          </div>
          {openWarning ? (
            <div>
              <label htmlFor={`res-${wall.surfaceId}`} className="field-label">What you found and did about the warning</label>
              <textarea id={`res-${wall.surfaceId}`} className="field-input min-h-20" value={draft.resolution} onChange={(e) => change({ resolution: e.target.value })} maxLength={CREW_LIMITS.note} placeholder="e.g. open chase behind the stack, blocked it, checked the basement" />
              <p className="field-error">{fieldErrors.resolution}</p>
            </div>
          ) : null}
          <label className="flex min-h-14 cursor-pointer items-center gap-3 rounded-md border border-line px-3">
            <input type="checkbox" className="size-7 accent-spruce-700" checked={draftFinished} onChange={(e) => change({ finished: e.target.checked })} />
            <span className="text-lg font-semibold">Wall finished</span>
          </label>
          {previewOver || previewUnder ? (
            <p className="rounded-md bg-warn-bg px-3 py-2 font-semibold text-warn" data-testid="preview-warning">
              This entry takes the wall to {after.ratio?.toFixed(2)}× expected: {previewOver ? OVER_TITLE : UNDER_TITLE}
            </p>
          ) : null}
          <button type="button" className="btn-primary min-h-14 w-full text-lg" onClick={save} disabled={nothingToSave}>
            Save entry for {wall.name}
          </button>
        </div>
      ) : null}

      {rejected.map((r) => (
        <div key={r.clientRequestId} role="alert" className="mt-3 rounded-md bg-danger-bg px-3 py-2 text-danger">
          <p>An entry of {bagsText(Number(r.body.bagsBlown ?? 0))} bags was refused: {Object.values(r.fields ?? {}).flat().join(" ") || r.error}</p>
          <button type="button" className="btn-ghost mt-2 min-h-12" onClick={() => onDiscard?.(r.clientRequestId)}>Dismiss</button>
        </div>
      ))}

      <details className="mt-4" open={!canWrite}>
        <summary className="min-h-11 cursor-pointer py-2 font-semibold text-spruce-800">Entries ({wall.entries.length + inFlight.length})</summary>
        <ol className="mt-2 space-y-2" data-testid="wall-entries">
          {wall.entries.map((e) => (
            <li key={e.id} className="rounded-md border border-line px-3 py-2 text-sm" data-testid="logged-entry">
              <span className="font-semibold">{bagsText(e.bagsBlown)} bags · {e.holesDrilled} holes</span>
              {e.blockedBays ? ` · ${e.blockedBays} blocked` : ""}
              {e.prefilledBays ? ` · ${e.prefilledBays} pre-filled` : ""}
              {e.finished ? " · finished" : ""}
              <span className="block text-ink-muted">{e.user.name}, {whenText(e.loggedAt)}</span>
              {e.note ? <span className="block">{e.note}</span> : null}
              {e.resolution ? <span className="block"><strong>Resolution:</strong> {e.resolution}</span> : null}
            </li>
          ))}
          {inFlight.map((q) =>
            q.state === "pending" ? (
              <li key={q.clientRequestId} className="rounded-md border-2 border-dashed border-warn bg-warn-bg px-3 py-2 text-sm" data-testid="pending-entry">
                <span className="font-semibold">{bagsText(Number(q.body.bagsBlown ?? 0))} bags · {Number(q.body.holesDrilled ?? 0)} holes</span>
                <span className="block font-semibold text-warn">Pending — kept on this phone, not sent yet ({whenText(q.queuedAt)})</span>
              </li>
            ) : (
              <li key={q.clientRequestId} className="rounded-md border border-line px-3 py-2 text-sm">
                <span className="font-semibold">{bagsText(Number(q.body.bagsBlown ?? 0))} bags · {Number(q.body.holesDrilled ?? 0)} holes</span>
                <span className="block text-ink-muted">Saved — refreshing the list</span>
              </li>
            ),
          )}
        </ol>
      </details>
    </section>
  );
}
