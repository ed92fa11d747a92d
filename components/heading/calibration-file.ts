/**
 * Reads a file of readings picked on the calibration page into its text box, in the browser (it
 * is never uploaded); a file too large or unreadable is reported beside the file field. Loads when
 * a file is picked.
 */
import { formatNumber } from "../../calc/core/units.ts";
import type { CalibrationModel } from "./calibration-model.ts";

/** Largest file read, in bytes (a log of 500 readings is a few kilobytes). */
const MAX_FILE_BYTES = 1_000_000;

export function readReadingsFile(model: Pick<CalibrationModel, "fileError" | "text">, file: File): void {
  if (file.size > MAX_FILE_BYTES) {
    model.fileError.value = `That file is ${formatNumber(file.size / 1e6)} MB; this page reads files up to 1 MB.`;
    return;
  }
  const reader = new FileReader();
  reader.onload = () => {
    model.fileError.value = null;
    model.text.value = String(reader.result ?? "");
  };
  reader.onerror = () => {
    model.fileError.value = "The file could not be read.";
  };
  reader.readAsText(file);
}
