"use client";

import { useActionState } from "react";
import { createJobAction } from "@/app/(office)/jobs/new/actions";
import { Field, FormMessage } from "@/components/forms/field";
import { SelectField } from "@/components/forms/select-field";
import type { ActionState } from "@/lib/authz/actions";
import { foundationValues, shieldingValues, storiesValues } from "@/lib/validation/job";

const foundationLabels: Record<(typeof foundationValues)[number], string> = { basement: "Basement", crawlspace: "Crawlspace", slab: "Slab on grade", other: "Other" };
const shieldingLabels: Record<(typeof shieldingValues)[number], string> = { "well-shielded": "Well shielded (trees, close neighbours)", normal: "Normal", exposed: "Exposed (open site)" };

export function NewJobForm({ stations }: { stations: { wmo: string; label: string }[] }) {
  const [state, action, pending] = useActionState<ActionState, FormData>(createJobAction, {});
  const v = state.values ?? {};
  const e = state.fields ?? {};
  const field = (name: string, label: string, props: Record<string, unknown> = {}) => (
    <Field key={`${name}:${v[name] ?? ""}`} name={name} label={label} defaultValue={v[name]} errors={e[name]} {...props} />
  );
  return (
    <form action={action} noValidate className="space-y-8">
      <FormMessage message={state.message} ok={state.ok} />
      <fieldset className="card space-y-4">
        <legend className="px-1 font-display text-xl font-semibold text-spruce-800">Client</legend>
        <div className="grid gap-4 sm:grid-cols-2">
          {field("client.name", "Name", { autoComplete: "name", required: true })}
          {field("client.email", "E-mail", { type: "email", autoComplete: "email" })}
          {field("client.phone", "Phone", { type: "tel", autoComplete: "tel" })}
          {field("title", "Job title (optional)", { hint: "Defaults to the street address." })}
        </div>
      </fieldset>

      <fieldset className="card space-y-4">
        <legend className="px-1 font-display text-xl font-semibold text-spruce-800">House</legend>
        <div className="grid gap-4 sm:grid-cols-2">
          {field("house.street", "Street address", { autoComplete: "street-address", required: true })}
          {field("house.city", "Town or city", { required: true })}
          {field("house.state", "State", { maxLength: 2, placeholder: "NJ" })}
          {field("house.postalCode", "ZIP code", { inputMode: "numeric" })}
          {field("house.yearBuilt", "Year built", { inputMode: "numeric" })}
          <SelectField name="house.stories" label="Stories above grade" value={v["house.stories"]} errors={e["house.stories"]} options={storiesValues.map((s) => ({ value: s, label: s }))} />
          {field("house.conditionedAreaFt2", "Conditioned floor area (ft²)", { inputMode: "decimal" })}
          {field("house.ceilingHeightFt", "Average ceiling height (ft)", { inputMode: "decimal", hint: "Used to compute volume when volume is left blank." })}
          {field("house.volumeFt3", "Conditioned volume (ft³)", { inputMode: "decimal" })}
          {field("house.bedrooms", "Bedrooms", { inputMode: "numeric" })}
          <SelectField name="house.foundation" label="Foundation" value={v["house.foundation"]} errors={e["house.foundation"]} options={foundationValues.map((f) => ({ value: f, label: foundationLabels[f] }))} />
          <SelectField name="house.shielding" label="Shielding from wind" value={v["house.shielding"] ?? "normal"} errors={e["house.shielding"]} options={shieldingValues.map((s) => ({ value: s, label: shieldingLabels[s] }))} />
          <SelectField name="house.climateStationWmo" label="Climate station" value={v["house.climateStationWmo"]} errors={e["house.climateStationWmo"]} placeholder="Choose later" options={stations.map((s) => ({ value: s.wmo, label: s.label }))} />
        </div>
      </fieldset>

      <div className="flex justify-end">
        <button type="submit" className="btn-primary" disabled={pending}>{pending ? "Saving…" : "Create job"}</button>
      </div>
    </form>
  );
}
