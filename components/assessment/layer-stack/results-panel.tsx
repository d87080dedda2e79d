import { DEFAULT_METHOD, type AssemblyResult, type Construction, type UMethod } from "@/calc/assemblies";
import { formatFraction, formatR, formatU, R_UNIT, U_UNIT, type Units } from "./format";

export const METHOD_LABELS: Record<UMethod, string> = { "parallel-path": "Parallel path", "isothermal-planes": "Isothermal planes" };
const METHOD_NOTES: Record<UMethod, string> = {
  "parallel-path": "Heat flows through framing and cavity side by side, each path through every layer.",
  "isothermal-planes": "Each layer is taken at one temperature; the framed layer's paths combine first.",
};

function MethodCard({ method, result, units, construction }: { method: UMethod; result: AssemblyResult; units: Units; construction: Construction }) {
  const r = method === "parallel-path" ? result.parallelPath : result.isothermalPlanes;
  const isDefault = DEFAULT_METHOD[construction] === method;
  const used = result.method === method;
  return (
    <div className={`min-w-0 rounded-lg border p-3 sm:p-4 ${used ? "border-spruce-600 bg-spruce-50" : "border-line bg-white"}`} data-method={method} data-u-ip={r.uFactorIP}>
      <h4 className="font-sans text-sm font-semibold text-charcoal">{METHOD_LABELS[method]}</h4>
      <p className="mt-1 font-display text-3xl leading-tight text-spruce-800 tabular-nums sm:text-4xl">
        <span data-testid={`u-${method}`}>{formatU(r.uFactorIP, units)}</span>
      </p>
      <p className="text-xs text-ink-muted">U-factor, {U_UNIT[units]}</p>
      <p className="mt-1 text-sm font-medium tabular-nums text-charcoal">{formatR(r.rValueIP, units)} overall</p>
      <div className="mt-2 flex flex-wrap gap-1">
        {isDefault ? <span className="rounded bg-ember-100 px-2 py-0.5 text-xs font-semibold text-ember-700">Default for {construction}</span> : null}
        {used ? <span className="rounded bg-spruce-700 px-2 py-0.5 text-xs font-semibold text-white">Used in results</span> : null}
      </div>
      <p className="mt-2 hidden text-xs text-ink-muted sm:block">{METHOD_NOTES[method]}</p>
    </div>
  );
}

/** R of each path and U by both methods, live from computeAssembly. */
export function ResultsPanel({ result, problems, units, construction }: { result?: AssemblyResult; problems: string[]; units: Units; construction: Construction }) {
  return (
    <section aria-label="R and U of this assembly" aria-live="polite" className="card space-y-4 p-4 sm:p-5">
      <h3 className="text-lg font-semibold">R per path and U-factor</h3>
      {problems.length ? (
        <div role="alert" className="rounded-md bg-danger-bg px-3 py-2 text-sm text-danger">
          <p className="font-semibold">{result ? "Check these fields:" : "Cannot calculate until these are fixed:"}</p>
          <ul className="mt-1 list-disc pl-5">{problems.map((m, i) => <li key={i}>{m}</li>)}</ul>
        </div>
      ) : null}
      {result ? (
        <>
          <div className="grid grid-cols-2 gap-3">
            <MethodCard method="parallel-path" result={result} units={units} construction={construction} />
            <MethodCard method="isothermal-planes" result={result} units={units} construction={construction} />
          </div>
          <p className="text-sm text-ink-muted">Results use <strong className="text-charcoal">{METHOD_LABELS[result.method]}</strong> ({result.methodReason}). R in {R_UNIT[units]}.</p>
          {result.framing ? (
            <div className="-mx-1 overflow-x-auto">
              <table className="w-full min-w-[18rem] text-left text-sm">
                <caption className="sr-only">R of each heat-flow path through the framed layer</caption>
                <thead className="text-ink-muted">
                  <tr><th scope="col" className="px-1 py-1 font-semibold">Path</th><th scope="col" className="px-1 py-1 text-right font-semibold">Area</th><th scope="col" className="px-1 py-1 text-right font-semibold">Framed layer</th><th scope="col" className="px-1 py-1 text-right font-semibold">Whole path</th></tr>
                </thead>
                <tbody className="tabular-nums">
                  {result.framing.paths.map((p) => (
                    <tr key={p.label} className="border-t border-line" data-path={p.label} data-r-ip={p.totalRIP}>
                      <th scope="row" className="px-1 py-2 font-medium">{p.label.replace(/^cavity: /, "Cavity: ").replace(/^framing/, "Framing")}</th>
                      <td className="whitespace-nowrap px-1 py-2 text-right">{formatFraction(p.areaFraction)}</td>
                      <td className="whitespace-nowrap px-1 py-2 text-right">{formatR(p.framedLayerRIP, units)}</td>
                      <td className="whitespace-nowrap px-1 py-2 text-right font-semibold">{formatR(p.totalRIP, units)}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
              <p className="mt-2 px-1 text-xs text-ink-muted">Framing fraction {+result.framing.framingFraction.toFixed(4)} ({result.framing.framingFractionSource}); the other layers add {formatR(result.continuousRIP, units)} to every path.</p>
            </div>
          ) : (
            <p className="text-sm text-ink-muted">No framed layer: one path through every layer, so both methods agree.</p>
          )}
        </>
      ) : null}
    </section>
  );
}
