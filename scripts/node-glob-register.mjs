// Registers scripts/node-glob.mjs (see there) for `node --import`.
import { register } from "node:module";

register("./node-glob.mjs", import.meta.url);
