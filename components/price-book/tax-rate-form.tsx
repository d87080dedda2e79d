"use client";

import { useState, type FormEvent } from "react";
import { FormMessage } from "@/components/forms/field";
import { sendJson } from "@/lib/hooks/fetcher";
import { taxRateLabel } from "@/lib/documents/snapshot";
import { parseTaxRatePercent } from "@/lib/validation/price-book";
import { problemFrom, TextInput } from "./draft";

const asPercent = (ppm: number) => String(Number((ppm / 10_000).toFixed(4)));

/**
 * The company's sales tax rate, applied to the taxable lines of new proposals. Kept in parts per
 * million, so rates such as 6.625 % are exact. The owner edits it; others read it.
 */
export function TaxRateForm({ canEdit, initialPpm }: { canEdit: boolean; initialPpm: number }) {
  const [ppm, setPpm] = useState(initialPpm);
  const [typed, setTyped] = useState(asPercent(initialPpm));
  const [errors, setErrors] = useState<string[] | undefined>();
  const [message, setMessage] = useState<{ text: string; ok: boolean } | undefined>();
  const [pending, setPending] = useState(false);

  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const checked = parseTaxRatePercent(typed);
    if (!checked.ok) {
      setErrors([checked.message]);
      setMessage(undefined);
      return;
    }
    setPending(true);
    try {
      const saved = await sendJson<{ taxRatePpm: number }>("/api/price-book/tax-rate", "PUT", { taxRatePercent: typed });
      setPpm(saved.taxRatePpm);
      setErrors(undefined);
      setMessage({ text: `Sales tax is now ${taxRateLabel(saved.taxRatePpm)} on taxable lines of new proposals. Proposals already issued keep their rate.`, ok: true });
    } catch (err) {
      const problem = problemFrom(err);
      setErrors(problem.fields.taxRatePercent);
      setMessage({ text: problem.message, ok: false });
    } finally {
      setPending(false);
    }
  }

  if (!canEdit) {
    return (
      <p className="card mb-6 text-sm" data-testid="tax-rate">
        Sales tax on taxable lines of proposals: <span className="font-semibold">{taxRateLabel(ppm)}</span>. Upgrade costs in savings reports are before tax.
      </p>
    );
  }
  return (
    <form onSubmit={submit} noValidate className="card mb-6 space-y-3" aria-labelledby="tax-rate-heading" data-testid="tax-rate-form">
      <h2 id="tax-rate-heading" className="text-xl font-semibold text-spruce-800">Sales tax</h2>
      <p className="max-w-prose text-sm text-ink-muted">
        Applied to the taxable lines of new proposals (up to four decimal places, e.g. 6.625). Upgrade costs in the assessment and the savings report are before tax. Your accountant or the state&apos;s tax office says which work is taxable.
      </p>
      <FormMessage message={message?.text} ok={message?.ok} />
      <div className="flex flex-wrap items-end gap-3">
        <TextInput id="tax-rate" name="taxRatePercent" label="Sales tax rate (%)" value={typed} onChange={setTyped} errors={errors} inputMode="decimal" placeholder="0" maxLength={12} />
        <button type="submit" className="btn-primary" disabled={pending}>{pending ? "Saving…" : "Save rate"}</button>
      </div>
      <p className="text-sm" data-testid="tax-rate">Current rate: <span className="font-semibold">{taxRateLabel(ppm)}</span></p>
    </form>
  );
}
