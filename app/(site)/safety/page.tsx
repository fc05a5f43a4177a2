import type { Metadata } from "next";

export const metadata: Metadata = { title: "Shop safety" };

const SECTIONS: { title: string; points: string[] }[] = [
  {
    title: "Saws",
    points: [
      "Wear safety glasses every time a saw runs, and hearing protection for anything louder than a conversation.",
      "Keep guards in place; let the blade stop before you reach near it. Use a push stick on a table saw for narrow rips.",
      "Support long boards on both sides of the cut so the offcut does not pinch the blade and kick back.",
      "Unplug or pull the battery before changing a blade or clearing a jam.",
    ],
  },
  {
    title: "Nailers",
    points: [
      "Treat a nailer as loaded at all times; never point it at anyone, and keep your free hand well away from the nose.",
      "Use the sequential (single-shot) trigger for trim; bump firing is for framing crews who are trained on it.",
      "A nail that misses the stud can exit the face of a thin batten or glance off a knot — angle it away from your hand.",
      "Disconnect the air or battery before clearing a jam.",
    ],
  },
  {
    title: "Ladders",
    points: [
      "Set a step ladder fully open and locked on firm, level ground; do not stand on the top cap or the step below it.",
      "Keep three points of contact and your belt buckle between the rails; move the ladder rather than reaching.",
      "Read the ladder's duty rating and keep yourself plus tools and material under it.",
    ],
  },
  {
    title: "Dust and finishes",
    points: [
      "MDF and sanding dust are fine enough to reach deep in the lungs: cut with dust collection and wear a fitted respirator (N95 or better).",
      "Ventilate when caulking, priming or painting, and keep solvent rags in a sealed metal can — oily rags can self-heat.",
    ],
  },
  {
    title: "Stairs and guards",
    points: [
      "Stairs and guards protect people from falls. The numbers in Sixteenths follow the model residential code, but the code adopted where you build — and your building official — decide what passes.",
      "Where a permit or inspection is required, get one. Structural work belongs to licensed practice.",
    ],
  },
];

export default function SafetyPage() {
  return (
    <article className="mx-auto max-w-prose space-y-8">
      <header className="space-y-3">
        <h1 className="text-3xl">Shop safety</h1>
        <p className="text-lg text-ink-soft">
          Layout is the safe part of carpentry; cutting and fastening are not. These notes are the usual cautions, not a full safety
          course. Follow your instructor, your school&rsquo;s shop rules and each tool&rsquo;s manual, and defer to your local codes
          and licensed professionals.
        </p>
      </header>
      {SECTIONS.map((section) => (
        <section key={section.title} aria-labelledby={`s-${section.title}`} className="space-y-2">
          <h2 id={`s-${section.title}`} className="text-xl">
            {section.title}
          </h2>
          <ul className="list-disc space-y-2 pl-6">
            {section.points.map((point) => (
              <li key={point}>{point}</li>
            ))}
          </ul>
        </section>
      ))}
    </article>
  );
}
