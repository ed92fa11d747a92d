/**
 * The printed sheet's QR code: the link that reopens the design, drawn as an SVG. Loaded with a
 * dynamic import when someone prints, so the build sheet's first load carries neither the encoder
 * nor the link codec. Everything is computed here, in the browser: nothing is requested.
 */
import encodeQR from "qr";
import type { Design } from "../../calc/design/design.ts";
import { designAddress, qrPath } from "./print.ts";
import { designToFragment } from "./share.ts";

/** Quiet zone around the code [modules]; the standard asks for four. */
const QUIET_ZONE = 4;

export interface PrintedCode {
  /** The link the code holds. */
  address: string;
  /** Modules per side, without the quiet zone. */
  modules: number;
  /** The code as an SVG element's markup, sized by its parent. */
  svg: string;
}

/**
 * The QR code of the link that reopens `design` on the page at `origin` + `pathname`. Low error
 * correction (7 %): the code sits on a printed sheet, not on a worn sticker, and every extra
 * percent of correction makes its modules smaller at the same printed size.
 */
export function printedCode(design: Design, origin: string, pathname: string): PrintedCode {
  const address = designAddress(origin, pathname, designToFragment(design));
  // The matrix includes the quiet zone (light modules) on every side.
  const matrix = encodeQR(address, "raw", { ecc: "low", border: QUIET_ZONE });
  const side = matrix.length;
  const svg =
    `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${side} ${side}" shape-rendering="crispEdges" role="img" aria-label="QR code of the link to this design">` +
    `<rect width="${side}" height="${side}" fill="#fff"/><path fill="#000" d="${qrPath(matrix)}"/></svg>`;
  return { address, modules: side - 2 * QUIET_ZONE, svg };
}

/** Today's date on this device, as printed: "2026-12-05". */
function localDate(now: Date): string {
  return `${now.getFullYear()}-${String(now.getMonth() + 1).padStart(2, "0")}-${String(now.getDate()).padStart(2, "0")}`;
}

/**
 * Fills the print view's block (the QR code and the words under it) and the printed date for
 * `design`, the design on this page. Called when someone prints; shows the block.
 */
export function fillPrintBlock(block: HTMLElement, design: Design): PrintedCode {
  const code = printedCode(design, window.location.origin, window.location.pathname);
  block.querySelector("[data-print=code]")!.innerHTML = code.svg;
  block.querySelector("[data-print=note]")!.textContent =
    `Scan to reopen this design with every value on the build sheet: the code holds the whole design (a link of ${code.address.length} characters), made on this device.`;
  for (const date of document.querySelectorAll("[data-print=date]")) date.textContent = localDate(new Date());
  block.dataset.address = code.address;
  block.hidden = false;
  return code;
}
