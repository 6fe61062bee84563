import assert from "node:assert/strict";
import { test } from "node:test";
import { clickedLine, outcome, previewHtml, runWithInput, stdinArgs } from "../cli";

// A stand-in for the command line: echoes standard input and exits with the code it is given.
const fake = (code: number) => ["-e", `let s="";process.stdin.on("data",d=>s+=d).on("end",()=>{process.stdout.write("got:"+s);process.exit(${code});});`];

test("output of a list with errors (exit 1) is kept, not discarded", async () => {
  const run = await runWithInput(process.execPath, fake(1), "motor M-1 5hp\n");
  assert.equal(run.code, 1);
  assert.deepEqual(outcome(run), { text: "got:motor M-1 5hp\n", hasErrors: true });
});

test("a clean list (exit 0) gives its output without the error note", async () => {
  assert.deepEqual(outcome(await runWithInput(process.execPath, fake(0), "x")), { text: "got:x", hasErrors: false });
});

test("a usage error (exit 2) is a failure with the command line's message", () => {
  assert.deepEqual(outcome({ code: 2, stdout: "", stderr: "motorlang: unknown option\n" }), { failure: "MotorLang could not produce it: motorlang: unknown option" });
  assert.ok("failure" in outcome({ code: null, stdout: "", stderr: "" }));
});

test("the buffer goes on standard input under its file name, never through the saved file", () => {
  assert.deepEqual(stdinArgs(["/ext/server/motorlang.dll", "lsp"], ["schedule", "--format", "markdown"], "/w/plant.motors"),
    ["/ext/server/motorlang.dll", "schedule", "--format", "markdown", "-", "--stdin-filename", "/w/plant.motors"]);
});

test("the preview replaces the report's policy with one allowing only its own script", () => {
  const report = `<html><head><meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src data:"></head><body><tr data-line="18"></tr></body></html>`;
  const html = previewHtml(report, "abc123", "vscode-resource:");
  assert.match(html, /script-src 'nonce-abc123'/);
  assert.equal((html.match(/Content-Security-Policy/g) ?? []).length, 1);
  assert.match(html, /<script nonce="abc123">[^]*<\/script><\/body>/);
});

test("a clicked row's 1-based line becomes the editor's 0-based line; anything else is ignored", () => {
  assert.equal(clickedLine({ line: 18 }), 17);
  assert.equal(clickedLine({ line: 0 }), undefined); // the supply has no line
  assert.equal(clickedLine({ line: "3" }), undefined);
  assert.equal(clickedLine(null), undefined);
});
