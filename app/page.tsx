import Link from "next/link";
import { Wordmark } from "@/components/brand/logo";

const steps = [
  { title: "Intake", text: "Client, address, year built, floor area, heating system and the local climate, in one job record." },
  { title: "Test-in", text: "Each wall, ceiling and floor as a surface with its layer stack, plus the blower-door reading and photos." },
  { title: "Analysis", text: "U-factors, heat loss, natural infiltration and annual heating energy by published handbook methods, with every input shown." },
  { title: "Proposal", text: "Upgrades priced from your price book — dense-pack bags, labour, holes, air sealing — with savings, payback and SIR." },
  { title: "Install", text: "Crews log holes and bags wall by wall on a phone; a wall that takes far more or less than expected is flagged at once." },
  { title: "Test-out", text: "A second blower-door reading and the savings report re-issued with measured leakage, for the homeowner to keep." },
];

export default function LandingPage() {
  return (
    <main className="mx-auto max-w-5xl px-5 py-8 sm:py-12">
      <header className="flex items-center justify-between gap-4">
        <Wordmark />
        <Link href="/sign-in" className="btn-primary">
          Sign in
        </Link>
      </header>

      <section className="mt-12 max-w-3xl">
        <h1 className="text-4xl font-bold text-spruce-900 sm:text-5xl">Every house, from first visit to test-out, in one record.</h1>
        <p className="mt-5 text-lg text-ink-muted">
          Warmstead is for home-performance companies: the auditor who measures the house, the crew that air-seals it and
          dense-packs its walls, the office that prices the work, and the homeowner who wants to know what it will save. It
          replaces the clipboard, the R-value spreadsheet and the hand-drawn bag count with numbers you can defend.
        </p>
      </section>

      <ol className="mt-12 grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        {steps.map((s, i) => (
          <li key={s.title} className="card">
            <p className="text-sm font-semibold text-ember-700">Step {i + 1}</p>
            <h2 className="mt-1 text-xl font-semibold text-spruce-800">{s.title}</h2>
            <p className="mt-2 text-ink-muted">{s.text}</p>
          </li>
        ))}
      </ol>

      <p className="mt-12 border-t border-line pt-6 text-sm text-ink-muted">
        Figures are estimates from published methods. Insulation, air sealing and electrical or combustion work follow local
        codes and licensed practice.
      </p>
    </main>
  );
}
