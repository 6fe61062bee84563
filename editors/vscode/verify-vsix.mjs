// Checks that the packaged extension holds the server, the grammar and the bundled client, and
// nothing else: no launcher, debug symbols, translated resources, sources or tests it never uses.
// `node verify-vsix.mjs FILE [TARGET]`: with a TARGET (linux-x64), a platform package, whose server
// is one self-contained executable instead of assemblies for the installed runtime.
import { execFileSync } from "node:child_process";

const vsix = process.argv[2] ?? "motorlang.vsix";
const platform = process.argv[3];

const entries = execFileSync("python3", ["-c",
  "import sys, zipfile; print('\\n'.join(zipfile.ZipFile(sys.argv[1]).namelist()))", vsix], { encoding: "utf8" })
  .split("\n").filter((line) => line.length > 0);
const server = platform
  ? ["extension/server/motorlang"]
  : ["extension/server/motorlang.dll", "extension/server/MotorLang.Server.dll", "extension/server/motorlang.runtimeconfig.json", "extension/server/motorlang.deps.json"];
const required = [
  ...server,
  "extension/syntaxes/motorlang.tmLanguage.json",
  "extension/snippets/motorlang.json",
  "extension/language-configuration.json",
  "extension/dist/extension.js",
  "extension/readme.md",
];
// Everything the extension uses at run time, and the two files every .vsix has.
const allowed = [
  /^\[Content_Types\]\.xml$/,
  /^extension\.vsixmanifest$/,
  /^extension\/(package\.json|readme\.md|language-configuration\.json)$/,
  /^extension\/dist\/extension\.js$/,
  ...(platform ? [/^extension\/server\/motorlang$/] : [/^extension\/server\/[^/]+\.dll$/, /^extension\/server\/motorlang\.(deps|runtimeconfig)\.json$/]),
  /^extension\/snippets\/[^/]+\.json$/,
  /^extension\/syntaxes\/[^/]+\.json$/,
];
const missing = required.filter((f) => !entries.includes(f));
const unused = entries.filter((f) => !allowed.some((pattern) => pattern.test(f)));
if (missing.length > 0 || unused.length > 0) {
  if (missing.length > 0) console.error(`${vsix} is missing: ${missing.join(", ")}`);
  if (unused.length > 0) console.error(`${vsix} holds files it never uses (.vscodeignore, or the server publish): ${unused.join(", ")}`);
  process.exit(1);
}
if (!platform) {
  const runtimeConfig = JSON.parse(execFileSync("python3", ["-c",
    "import sys, zipfile; sys.stdout.write(zipfile.ZipFile(sys.argv[1]).read('extension/server/motorlang.runtimeconfig.json').decode())", vsix], { encoding: "utf8" }));
  if (runtimeConfig.runtimeOptions?.rollForward !== "Major") {
    console.error("the server's runtimeconfig does not roll forward to newer .NET majors (RollForward=Major)");
    process.exit(1);
  }
}
console.log(`${vsix} holds the ${required.length} required files and nothing unused (${entries.length} entries)`);
