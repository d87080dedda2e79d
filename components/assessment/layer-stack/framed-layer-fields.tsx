"use client";
import { defaultFramingFraction, MEMBER_DEPTH_IN, memberDepthIn, type Construction, type FramedLayerSpec, type FramingMember, type SurfaceKind } from "@/calc/assemblies";
import { getMaterial, materials } from "@/calc/materials";
import { CATEGORY_LABELS, isCavityFill, MEMBER_LABELS } from "./catalog";
import { ChoiceField, type Choice } from "./choice-field";
import { formatIn } from "./format";
import { framingFractionWarning, type FieldIssues } from "./model";
import { NumberField } from "./number-field";

const MEMBERS = Object.keys(MEMBER_LABELS) as FramingMember[];
const memberChoices: Choice[] = MEMBERS.map((m) => ({ value: m, label: m in MEMBER_DEPTH_IN ? `${MEMBER_LABELS[m]} · ${MEMBER_DEPTH_IN[m as keyof typeof MEMBER_DEPTH_IN]} in.` : MEMBER_LABELS[m] }));
const fillChoices: Choice[] = [{ value: "", label: "Empty cavity (air space)" }, ...materials.filter(isCavityFill).map((m) => ({ value: m.key, label: m.name, group: CATEGORY_LABELS[m.category] }))];

type Props = { id: string; path: string; spec: FramedLayerSpec; kind: SurfaceKind; construction: Construction; issues: FieldIssues; onChange: (s: FramedLayerSpec) => void; readOnly?: boolean };

/** Drop keys set to undefined, so "use the default" leaves no trace in the definition. */
function tidy(s: FramedLayerSpec): FramedLayerSpec {
  return Object.fromEntries(Object.entries(s).filter(([, v]) => v !== undefined)) as unknown as FramedLayerSpec;
}

/** Member, depth, spacing, framing fraction and the cavity fill of the framed layer. */
export function FramedLayerFields({ id, path, spec, kind, construction, issues, onChange, readOnly }: Props) {
  const set = (patch: Partial<FramedLayerSpec>) => onChange(tidy({ ...spec, ...patch }));
  const err = (f: string) => issues[`${path}.${f}`];
  const material = spec.framingMaterial ?? (construction === "steel-frame" ? "steel" : "wood");
  const spacing = spec.spacingIn !== undefined && spec.spacingIn > 0 ? spec.spacingIn : 16;
  const dflt = defaultFramingFraction(kind, spacing, material);
  const depth = memberDepthIn(spec);
  const fill = spec.cavityFill === null ? undefined : getMaterial(spec.cavityFill);
  const fillR = fill && depth !== undefined ? (fill.rPerInchIP !== undefined ? fill.rPerInchIP * depth : fill.rValueIP) : undefined;
  const dis = readOnly;
  return (
    <div className="grid gap-x-4 gap-y-2 sm:grid-cols-2 lg:grid-cols-3">
      <ChoiceField id={`${id}-member`} label="Framing member" value={spec.member} options={memberChoices} disabled={dis} errors={err("member")}
        onChange={(v) => set({ member: v as FramingMember })} />
      <NumberField id={`${id}-depth`} label="Depth" unit="in." value={spec.depthIn} readOnly={dis} errors={err("depthIn")}
        placeholder={spec.member === "custom" ? "required" : String(depth ?? "")}
        hint={spec.member === "custom" ? "Measure the cavity depth." : `Blank: the member's actual ${formatIn(depth)}`} onCommit={(v) => set({ depthIn: v })} />
      <NumberField id={`${id}-spacing`} label="Spacing" unit="in. on centre" value={spec.spacingIn} readOnly={dis} errors={err("spacingIn")}
        placeholder="16" hint="Blank: 16 in. Typical 16 or 24." onCommit={(v) => set({ spacingIn: v })} />
      <ChoiceField id={`${id}-fmat`} label="Framing material" value={spec.framingMaterial ?? ""} disabled={dis} errors={err("framingMaterial")}
        options={[{ value: "", label: `As the construction (${construction === "steel-frame" ? "steel" : "wood"})` }, { value: "wood", label: "Wood" }, { value: "steel", label: "Steel" }]}
        onChange={(v) => set({ framingMaterial: v === "" ? undefined : (v as "wood" | "steel") })} />
      <div>
        <NumberField id={`${id}-ff`} label="Framing fraction" unit="0–1" value={spec.framingFraction} readOnly={dis} errors={err("framingFraction")}
          placeholder={dflt.value.toFixed(3).replace(/0+$/, "")} warning={framingFractionWarning(spec.framingFraction, material)}
          hint={spec.framingFraction === undefined ? `Default ${+dflt.value.toFixed(4)}: ${dflt.source}.` : `Entered; the default would be ${+dflt.value.toFixed(4)}.`}
          onCommit={(v) => set({ framingFraction: v })} />
        {spec.framingFraction !== undefined && !dis ? (
          <button type="button" className="btn-ghost w-full" onClick={() => set({ framingFraction: undefined })}>Use default {+dflt.value.toFixed(4)}</button>
        ) : null}
      </div>
      <ChoiceField id={`${id}-fill`} label="Cavity fill" value={spec.cavityFill ?? ""} options={fillChoices} disabled={dis} errors={err("cavityFill")}
        onChange={(v) => set({ cavityFill: v === "" ? null : v, ...(v === "" ? { fillFraction: undefined, fillRValueIP: undefined } : {}) })} />
      {spec.cavityFill !== null ? (
        <>
          <NumberField id={`${id}-phi`} label="Fill fraction" unit="share of cavity filled, 0–1" value={spec.fillFraction} readOnly={dis} errors={err("fillFraction")}
            percent placeholder="1" hint="Blank: full. 0.5 for fibre slumped or stuffed half-way down the bay." onCommit={(v) => set({ fillFraction: v })} />
          <NumberField id={`${id}-fr`} label="Fill R across the cavity" unit="h·ft²·°F/Btu" value={spec.fillRValueIP} readOnly={dis} errors={err("fillRValueIP")}
            placeholder={fillR === undefined ? "" : fillR.toFixed(2)} hint="Blank: from the library and the depth." onCommit={(v) => set({ fillRValueIP: v })} />
        </>
      ) : null}
    </div>
  );
}
