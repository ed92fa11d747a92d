/** The demo design and its cards in both unit systems, as the build sheet's page computes them at build time (components/design/BuildSheet.astro). */
import { demoDesign } from "../../calc/design/demo.ts";
import { runChecks } from "../../calc/design/run-checks.ts";
import type { PreparedDemo } from "../../components/design/model.ts";

export function preparedDemo(): PreparedDemo {
  const design = demoDesign();
  return { design, metric: runChecks(design, "metric"), us: runChecks(design, "us") };
}
