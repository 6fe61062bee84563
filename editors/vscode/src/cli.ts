// Running the motorlang command line on an editor buffer, free of the 'vscode' module so node's test runner can check it.
import { spawn } from "child_process";

/** What a run of the command line gave: its exit code and both streams. */
export interface CliRun {
  code: number | null;
  stdout: string;
  stderr: string;
}

/**
 * Runs the command line with `input` on standard input (the buffer as it is in the editor, saved or
 * not). Resolves with the exit code and output whatever the code: exit 1 means "the list has errors",
 * and its output is still the schedule or report.
 */
export function runWithInput(command: string, args: string[], input: string, timeoutMs = 30000, env?: NodeJS.ProcessEnv): Promise<CliRun> {
  return new Promise((resolve) => {
    const child = spawn(command, args, { env, stdio: ["pipe", "pipe", "pipe"] });
    const out: Buffer[] = [];
    const err: Buffer[] = [];
    const timer = setTimeout(() => child.kill(), timeoutMs);
    child.stdout.on("data", (d: Buffer) => out.push(d));
    child.stderr.on("data", (d: Buffer) => err.push(d));
    child.on("error", (e) => {
      clearTimeout(timer);
      resolve({ code: null, stdout: "", stderr: String(e.message) });
    });
    child.on("close", (code) => {
      clearTimeout(timer);
      resolve({ code, stdout: Buffer.concat(out).toString("utf8"), stderr: Buffer.concat(err).toString("utf8") });
    });
    child.stdin.on("error", () => undefined);
    child.stdin.end(input, "utf8");
  });
}

/** The command line's arguments to read the buffer from standard input, named as its file. */
export function stdinArgs(serverArgs: string[], command: string[], fileName: string): string[] {
  // serverArgs ends with "lsp"; what comes before it (a .dll for dotnet) starts every command.
  return [...serverArgs.slice(0, -1), ...command, "-", "--stdin-filename", fileName];
}

/** The output to show, or why there is none: exit 0 and 1 both carry output; anything else is a failure with its message. */
export function outcome(run: CliRun): { text: string; hasErrors: boolean } | { failure: string } {
  if ((run.code === 0 || run.code === 1) && run.stdout.length > 0) return { text: run.stdout, hasErrors: run.code === 1 };
  const message = run.stderr.trim() || (run.code === null ? "the command line did not start" : `exit code ${run.code}`);
  return { failure: `MotorLang could not produce it: ${message}` };
}

/**
 * The report prepared for a webview: its Content-Security-Policy replaced by one that also allows the
 * one script below (by nonce), which posts the line of a clicked motor, feeder or diagram node.
 */
export function previewHtml(report: string, nonce: string, cspSource: string): string {
  const csp = `<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline' ${cspSource}; img-src data:; script-src 'nonce-${nonce}'">`;
  const script =
    `<script nonce="${nonce}">const vscode = acquireVsCodeApi();` +
    `document.addEventListener("click", (e) => { const t = e.target instanceof Element ? e.target.closest("[data-line]") : null;` +
    ` if (t) vscode.postMessage({ line: Number(t.getAttribute("data-line")) }); });</script>`;
  const withCsp = report.replace(/<meta http-equiv="Content-Security-Policy"[^>]*>/, csp);
  return withCsp.includes("</body>") ? withCsp.replace("</body>", `${script}</body>`) : withCsp + script;
}

/** The editor's 0-based line for a clicked element: the report marks rows and diagram nodes with 1-based data-line. */
export function clickedLine(message: unknown): number | undefined {
  if (message === null || typeof message !== "object" || !("line" in message)) return undefined;
  const line = (message as { line: unknown }).line;
  return typeof line === "number" && Number.isInteger(line) && line >= 1 ? line - 1 : undefined;
}
