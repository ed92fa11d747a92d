/**
 * A whole design in a link: the design's JSON, deflated (fflate), in base64url, with its length
 * and a checksum so that a link cut short by a messaging app, or damaged on the way, is reported
 * as such instead of being read wrongly. Form: `#d1.<length>.<data>.<checksum>`; the link ends in
 * hex digits, which link detectors keep.
 */
import { deflateSync, Inflate, strFromU8, strToU8 } from "fflate";
import { checksum } from "./saved.ts";
import { DESIGN_TEXT_LIMIT, designToText, readDesignText, type Design, type DesignReading } from "../../calc/design/design.ts";

const PREFIX = "d1.";

export { checksum };

function toBase64Url(bytes: Uint8Array): string {
  let binary = "";
  for (let i = 0; i < bytes.length; i += 1) binary += String.fromCharCode(bytes[i]!);
  return btoa(binary).replace(/\+/g, "-").replace(/\//g, "_").replace(/=+$/, "");
}

function fromBase64Url(text: string): Uint8Array {
  const base64 = text.replace(/-/g, "+").replace(/_/g, "/");
  const binary = atob(base64 + "=".repeat((4 - (base64.length % 4)) % 4));
  const bytes = new Uint8Array(binary.length);
  for (let i = 0; i < binary.length; i += 1) bytes[i] = binary.charCodeAt(i);
  return bytes;
}

/**
 * How much packed data is unpacked at a time [bytes]. DEFLATE unpacks at most 1032 bytes from one
 * (258 bytes for a two-bit match), so one step adds at most about 1 MB to what is checked.
 */
const INFLATE_STEP = 1024;

/**
 * Unpacks DEFLATE data a step at a time and stops as soon as the output passes `limit` bytes, so
 * a small link that would unpack to hundreds of megabytes costs no more than the limit. Null when
 * the output is too large; throws when the data is not DEFLATE.
 */
export function inflateWithin(data: Uint8Array, limit: number): Uint8Array | null {
  const chunks: Uint8Array[] = [];
  let size = 0;
  const inflater = new Inflate((chunk) => {
    size += chunk.length;
    if (size <= limit) chunks.push(chunk);
  });
  for (let at = 0; at < data.length; at += INFLATE_STEP) {
    inflater.push(data.subarray(at, at + INFLATE_STEP), at + INFLATE_STEP >= data.length);
    if (size > limit) return null;
  }
  const out = new Uint8Array(size);
  let at = 0;
  for (const chunk of chunks) {
    out.set(chunk, at);
    at += chunk.length;
  }
  return out;
}

/** The fragment (without "#") that carries a design. */
export function designToFragment(design: Design): string {
  const json = JSON.stringify(design);
  const data = toBase64Url(deflateSync(strToU8(json), { level: 9 }));
  return `${PREFIX}${data.length}.${data}.${checksum(data)}`;
}

export type FragmentReading = { kind: "none" } | { kind: "broken"; message: string } | { kind: "design"; reading: DesignReading };

/** Reads a fragment ("d1.…", with or without "#"). Never throws. */
export function designFromFragment(fragment: string): FragmentReading {
  const text = fragment.replace(/^#/, "").trim();
  if (!/^d\d/.test(text)) return { kind: "none" };
  if (!text.startsWith(PREFIX)) {
    return {
      kind: "broken",
      message: "This link holds a design in a format this handbook does not know (perhaps from a newer version). Ask for the design file instead.",
    };
  }
  const [lengthText, data = "", sum = ""] = text.slice(PREFIX.length).split(".");
  const length = Number(lengthText);
  if (!Number.isInteger(length) || length <= 0)
    return { kind: "broken", message: "This design link is damaged: its length field is missing. Ask for the link again, or for the design file." };
  if (data.length < length || sum.length < 8) {
    return {
      kind: "broken",
      message: `This design link is cut short: it should carry ${length + 9} characters of design data, but ${Math.min(data.length + (sum ? sum.length + 1 : 0), length + 9)} arrived. Some messaging apps shorten long links; ask for the design file instead.`,
    };
  }
  if (data.length !== length || !/^[A-Za-z0-9_-]+$/.test(data) || checksum(data) !== sum.slice(0, 8)) {
    return {
      kind: "broken",
      message: "This design link is damaged: its check digits do not match its contents. Ask for the link again, or for the design file.",
    };
  }
  let json: string;
  try {
    const bytes = inflateWithin(fromBase64Url(data), DESIGN_TEXT_LIMIT);
    if (bytes === null) {
      return {
        kind: "broken",
        message: `This design link is too large: it unpacks to more than ${DESIGN_TEXT_LIMIT / 1e6} MB, far more than any design holds. Ask for the design file instead.`,
      };
    }
    json = strFromU8(bytes);
  } catch {
    return { kind: "broken", message: "This design link is damaged: its contents cannot be unpacked. Ask for the link again, or for the design file." };
  }
  return { kind: "design", reading: readDesignText(json) };
}

export { designToText };
