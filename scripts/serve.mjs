// Serves the built handbook (dist/) on localhost with a tiny static server and prints the URL.
// Usage: npm start (builds first) or npm run serve. PORT=8080 to choose a port; BASE as built.
import { startStaticServer } from "./static-server.mjs";

const port = Number(process.env.PORT ?? 4321);
const base = process.env.BASE || "/";
const server = await startStaticServer({ root: new URL("../dist/", import.meta.url), port, base });
console.log(`\nWhirlbook is being served at ${server.url}\nPress Ctrl+C to stop.\n`);
