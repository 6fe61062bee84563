// Checks that the packaged extension holds the server, the grammar and the bundled client.
import { execFileSync } from "node:child_process";

const listing = execFileSync("python3", ["-m", "zipfile", "-l", "motorlang.vsix"], { encoding: "utf8" });
const required = [
  "extension/server/motorlang.dll",
  "extension/server/MotorLang.Server.dll",
  "extension/server/motorlang.runtimeconfig.json",
  "extension/syntaxes/motorlang.tmLanguage.json",
  "extension/snippets/motorlang.json",
  "extension/language-configuration.json",
  "extension/dist/extension.js",
  "extension/readme.md",
];
const missing = required.filter((f) => !listing.includes(f));
if (missing.length > 0) {
  console.error(`motorlang.vsix is missing: ${missing.join(", ")}`);
  process.exit(1);
}
console.log(`motorlang.vsix holds all ${required.length} required files`);
