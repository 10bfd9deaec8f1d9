import { Link } from "react-router";
import { buttonClasses } from "@/components/ui/button";
import { paths } from "@/lib/paths";
import { CamSketch } from "./cam-sketch";

const steps = [
  {
    title: "Pick a template",
    text: "A vise stop, a cam clamp, a set of parallels, soft jaws or a step block, each written as a parametric template by a designer who has made one.",
  },
  {
    title: "Enter your machine",
    text: "Your vise's jaw width, jaw height and jaw thickness, your table's T-slots and the stock on your rack. Millimetres or inches.",
  },
  {
    title: "Check, then make it",
    text: "Read the geometry checks and engineering numbers, turn the part in the 3D preview, then take the dimensioned drawings, cut list and operation sheet to the machine.",
  },
];

const numbers = [
  ["Cams", "throw, engagement angle, self-locking and the clamping force a hand on the lever gives"],
  [
    "Fits",
    "ISO 286 hole and shaft tolerances such as H7/g6, and ISO 2768 general tolerances for the title block",
  ],
  ["Threads", "ISO metric pitch, minor diameter, tap drill and engagement length"],
  ["Holes", "reaming allowance and pre-drill sizes, counterbores for socket head cap screws"],
  ["Cutting", "spindle speed from cutting speed and diameter, kept inside your machine's limits"],
  ["Stiffness", "how far a stop rod or clamp arm deflects under load, and what the part weighs"],
] as const;

const people = [
  ["Model engineers", "who make their own tooling between projects"],
  ["Toolmakers in small shops", "who re-size the same fixture for every vise"],
  ["Plan and kit makers", "whose customers must be able to machine from the drawing without guessing"],
  ["Apprentices and learners", "who want to see why a clamp holds before trusting it"],
] as const;

/**
 * What Jigwright is for, and the ways in. `cataloguePath` is where the template catalogue lives (the
 * route composes it in, so this feature does not import the catalogue's).
 */
export function HomePage({ signedIn, cataloguePath }: { signedIn: boolean; cataloguePath: string }) {
  return (
    <div>
      <section className="bg-steel-900 text-steel-100">
        <div className="mx-auto grid max-w-6xl items-center gap-8 px-4 py-12 md:grid-cols-[1.4fr_1fr]">
          <div>
            <p className="figure text-sm uppercase tracking-widest text-spark-300">
              Workholding · fixtures · stops
            </p>
            <h1 className="mt-2 text-4xl text-white sm:text-5xl">
              Size your shop accessories to your machine before you cut metal.
            </h1>
            <p className="mt-4 max-w-2xl text-lg text-steel-200">
              Jigwright turns a parametric template into a part made for your vise and your stock: geometry
              checks, the engineering numbers that matter, a 3D preview and a dimensioned drawing pack. You
              find out that a cam will not lock, a hole breaks out of a wall or a clamp will slip while it is
              still a drawing.
            </p>
            <div className="mt-6 flex flex-wrap gap-3">
              <Link to={cataloguePath} className={buttonClasses("primary")}>
                Browse the templates
              </Link>
              <Link to={paths.camCheck} className={buttonClasses("onDark")}>
                Check a cam clamp
              </Link>
            </div>
            {signedIn ? null : (
              <p className="mt-4 text-steel-300">
                Everything here works without an account;{" "}
                <Link
                  to={paths.register}
                  className="font-semibold text-spark-300 underline underline-offset-2"
                >
                  create a free one
                </Link>{" "}
                to keep your vises, machines and designs.
              </p>
            )}
          </div>
          <div className="rounded-xl bg-steel-50 p-4 shadow-lg">
            <CamSketch className="w-full" />
          </div>
        </div>
      </section>

      <div className="mx-auto max-w-6xl space-y-14 px-4 py-12">
        <section aria-labelledby="how-heading">
          <h2 id="how-heading" className="text-2xl">
            How it works
          </h2>
          <ol className="mt-4 grid gap-4 md:grid-cols-3">
            {steps.map((step, i) => (
              <li key={step.title} className="rounded-lg border border-steel-200 bg-white p-5 shadow-sm">
                <span className="figure inline-flex size-8 items-center justify-center rounded-full bg-spark-500 font-medium text-steel-950">
                  {i + 1}
                </span>
                <h3 className="mt-3 text-lg">{step.title}</h3>
                <p className="mt-1 text-steel-700">{step.text}</p>
                {i === 0 ? (
                  <Link
                    to={cataloguePath}
                    className="mt-2 inline-block font-semibold text-spark-700 underline underline-offset-2"
                  >
                    Open the catalogue
                  </Link>
                ) : null}
              </li>
            ))}
          </ol>
        </section>

        <section aria-labelledby="numbers-heading" className="grid gap-6 md:grid-cols-[1fr_2fr]">
          <div>
            <h2 id="numbers-heading" className="text-2xl">
              Numbers with their sources
            </h2>
            <p className="mt-2 text-steel-700">
              Every figure names where it comes from: a published standard, a handbook table or worked
              example, or a plainly labelled rule of common practice. Figures that feed a real setup come with
              the cautions that go with them; none of them is a guarantee.
            </p>
          </div>
          <dl className="grid gap-3 sm:grid-cols-2">
            {numbers.map(([term, text]) => (
              <div key={term} className="rounded-lg border-l-4 border-spark-500 bg-white px-4 py-3 shadow-sm">
                <dt className="font-semibold text-steel-950">{term}</dt>
                <dd className="text-steel-700">{text}</dd>
              </div>
            ))}
          </dl>
        </section>

        <section
          aria-labelledby="cam-heading"
          className="rounded-xl border border-steel-200 bg-white p-6 shadow-sm"
        >
          <h2 id="cam-heading" className="text-2xl">
            Will your cam clamp hold?
          </h2>
          <p className="mt-2 max-w-3xl text-steel-700">
            The cam check takes a circular cam&apos;s diameter and eccentricity, the pivot, the lever and the
            friction, and shows its throw, where it engages, whether it locks on its own and how hard it
            clamps for the force of your hand, with a chart over the whole turn. When a cam will not lock, it
            says which term is to blame and what to change. No account needed.
          </p>
          <Link to={paths.camCheck} className={buttonClasses("primary", "mt-4")}>
            Open the cam check
          </Link>
        </section>

        <section aria-labelledby="who-heading">
          <h2 id="who-heading" className="text-2xl">
            Who it is for
          </h2>
          <ul className="mt-4 grid gap-3 sm:grid-cols-2">
            {people.map(([who, why]) => (
              <li key={who} className="rounded-lg bg-steel-100 px-4 py-3">
                <span className="font-semibold text-steel-950">{who}</span>{" "}
                <span className="text-steel-700">{why}.</span>
              </li>
            ))}
          </ul>
        </section>
      </div>
    </div>
  );
}
