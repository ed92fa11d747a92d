/**
 * The calibration calculator as the build renders it into the chapter: the island
 * (components/calculators/calibration.tsx) with its results view at hand, so the page's HTML
 * holds the demo's results. The browser hydrates the island itself, which keeps that HTML until
 * something the results show changes and only then loads the view. Import this in the chapter as
 * the widget: `<Calculator widget={widget} start={…} />`; its island name is the island's.
 */
import CalibrationCalculator, { type CalibrationCalculatorProps } from "../calculators/calibration.tsx";
import * as results from "./calibration-results.tsx";

export { island } from "../calculators/calibration.tsx";

export default function CalibrationOnServer(props: CalibrationCalculatorProps) {
  return <CalibrationCalculator {...props} results={results} />;
}
