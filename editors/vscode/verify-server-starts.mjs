// Unpacks a platform .vsix and starts the server it carries the way the extension does, with no
// `dotnet` on PATH and nothing else inherited, then checks that it answers `initialize`.
// `node verify-server-starts.mjs motorlang-linux-x64.vsix`
import { execFileSync, spawn } from "node:child_process";
import * as fs from "node:fs";
import * as os from "node:os";
import * as path from "node:path";

const vsix = process.argv[2];
const dir = fs.mkdtempSync(path.join(os.tmpdir(), "motorlang-vsix-"));
const empty = path.join(dir, "empty-path");
fs.mkdirSync(empty);
execFileSync("python3", ["-c", "import sys, zipfile; zipfile.ZipFile(sys.argv[1]).extractall(sys.argv[2])", vsix, dir]);
const server = path.join(dir, "extension", "server", "motorlang");
// As the extension does when unpacking lost the mode.
fs.chmodSync(server, 0o755);

const child = spawn(server, ["lsp"], { env: { PATH: empty, HOME: dir, DOTNET_EnableDiagnostics: "0" }, stdio: ["pipe", "pipe", "pipe"] });
const send = (message) => {
  const body = Buffer.from(JSON.stringify({ jsonrpc: "2.0", ...message }), "utf8");
  child.stdin.write(`Content-Length: ${body.length}\r\n\r\n`);
  child.stdin.write(body);
};
let received = Buffer.alloc(0);
let stderr = "";
const finish = (code, text) => {
  (code === 0 ? console.log : console.error)(text);
  child.kill();
  fs.rmSync(dir, { recursive: true, force: true });
  process.exit(code);
};
const timer = setTimeout(() => finish(1, `${vsix}: the server did not answer initialize in 60 s. ${stderr}`), 60000);
child.stderr.on("data", (d) => { stderr += d; });
child.on("error", (e) => finish(1, `${vsix}: the server did not start: ${e.message}`));
child.stdout.on("data", (d) => {
  received = Buffer.concat([received, d]);
  const text = received.toString("utf8");
  const header = /Content-Length: (\d+)\r\n\r\n/.exec(text);
  if (!header) return;
  const start = header.index + header[0].length;
  const length = Number(header[1]);
  if (received.length < Buffer.byteLength(text.slice(0, start)) + length) return;
  const response = JSON.parse(received.subarray(Buffer.byteLength(text.slice(0, start)), Buffer.byteLength(text.slice(0, start)) + length).toString("utf8"));
  clearTimeout(timer);
  if (response.id !== 1 || !response.result?.capabilities) finish(1, `${vsix}: unexpected answer to initialize: ${JSON.stringify(response)}`);
  const name = response.result.serverInfo?.name ?? "the server";
  finish(0, `${vsix}: ${name} answered initialize with no dotnet on PATH (${Object.keys(response.result.capabilities).length} capabilities)`);
});
send({ id: 1, method: "initialize", params: { processId: null, rootUri: null, capabilities: {} } });
