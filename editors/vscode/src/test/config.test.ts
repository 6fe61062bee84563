import assert from "node:assert/strict";
import * as path from "node:path";
import { test } from "node:test";
import { commandTarget, ExtensionSettings, findRuntime, resolveServer, runtimeProblem, serverEnvironment, serverSettings } from "../config";

const defaults: ExtensionSettings = {
  serverPath: "",
  dotnetPath: "",
  inlayFullLoadCurrent: true,
  inlayMinimumWire: true,
  codeLens: true,
};

test("the bundled server runs through dotnet by default", () => {
  assert.deepEqual(resolveServer(defaults, "/ext", true), { command: "dotnet", args: [path.join("/ext", "server", "motorlang.dll"), "lsp"] });
});

test("a configured server and dotnet are used in a trusted workspace", () => {
  const s = { ...defaults, serverPath: "/opt/ml/motorlang.dll", dotnetPath: "/usr/share/dotnet/dotnet" };
  assert.deepEqual(resolveServer(s, "/ext", true), { command: "/usr/share/dotnet/dotnet", args: ["/opt/ml/motorlang.dll", "lsp"] });
});

test("a published executable runs directly", () => {
  assert.deepEqual(resolveServer({ ...defaults, serverPath: "/opt/ml/motorlang" }, "/ext", true), { command: "/opt/ml/motorlang", args: ["lsp"] });
});

test("a platform package's own executable runs directly, with no runtime", () => {
  assert.deepEqual(resolveServer(defaults, "/ext", true, "motorlang"), { command: path.join("/ext", "server", "motorlang"), args: ["lsp"] });
  assert.deepEqual(resolveServer(defaults, "/ext", false, "motorlang.exe"), { command: path.join("/ext", "server", "motorlang.exe"), args: ["lsp"] });
  // A configured server still wins in a trusted workspace.
  assert.deepEqual(resolveServer({ ...defaults, serverPath: "/opt/ml/motorlang.dll" }, "/ext", true, "motorlang"), { command: "dotnet", args: ["/opt/ml/motorlang.dll", "lsp"] });
});

test("configured paths are ignored in an untrusted workspace", () => {
  const s = { ...defaults, serverPath: "/tmp/evil", dotnetPath: "/tmp/evil-dotnet" };
  assert.deepEqual(resolveServer(s, "/ext", false), { command: "dotnet", args: [path.join("/ext", "server", "motorlang.dll"), "lsp"] });
});

test("settings map to the server's presentation options only", () => {
  assert.deepEqual(serverSettings({ ...defaults, inlayMinimumWire: false, codeLens: false }), {
    motorlang: { inlayHints: { fullLoadCurrent: true, minimumWire: false }, codeLens: false },
  });
});

test("the newest .NET runtime is found and judged", () => {
  const listing = [
    "Microsoft.AspNetCore.App 10.0.1 [/usr/share/dotnet/shared/Microsoft.AspNetCore.App]",
    "Microsoft.NETCore.App 8.0.20 [/usr/share/dotnet/shared/Microsoft.NETCore.App]",
    "Microsoft.NETCore.App 10.0.1 [/usr/share/dotnet/shared/Microsoft.NETCore.App]",
  ].join("\n");
  assert.deepEqual(findRuntime(listing), { version: "10.0.1", sufficient: true });
  assert.deepEqual(findRuntime("Microsoft.NETCore.App 8.0.20 [/x]"), { version: "8.0.20", sufficient: false });
  assert.equal(findRuntime(""), undefined);
});

test("a missing or old runtime gives a message that says what to install", () => {
  assert.match(runtimeProblem(undefined, "dotnet")!, /Install \.NET 10/);
  assert.match(runtimeProblem({ version: "8.0.20", sufficient: false }, "dotnet")!, /newest found is 8\.0\.20/);
  assert.equal(runtimeProblem({ version: "10.0.1", sufficient: true }, "dotnet"), undefined);
});

test("commands act on their argument, else on the active motor list", () => {
  assert.equal(commandTarget("file:///a.motors", "file:///b.motors", "motorlang"), "file:///a.motors");
  assert.equal(commandTarget(undefined, "file:///b.motors", "motorlang"), "file:///b.motors");
  assert.equal(commandTarget(undefined, "file:///b.txt", "plaintext"), undefined);
  assert.equal(commandTarget({ toString: () => "file:///c.motors" }, undefined, undefined), "file:///c.motors");
});

test("the server starts with runtime diagnostics off unless the user set them", () => {
  assert.deepEqual(serverEnvironment({ PATH: "/bin" }), { PATH: "/bin", DOTNET_EnableDiagnostics: "0" });
  assert.deepEqual(serverEnvironment({ PATH: "/bin", DOTNET_EnableDiagnostics: "1" }), { PATH: "/bin", DOTNET_EnableDiagnostics: "1" });
});
