import { execFile } from "child_process";
import * as fs from "fs";
import * as path from "path";
import * as vscode from "vscode";
import {
  CloseAction,
  CodeAction,
  CodeActionKind,
  CodeActionRequest,
  CodeActionResolveRequest,
  ErrorAction,
  LanguageClient,
  LanguageClientOptions,
  ServerOptions,
  TransportKind,
} from "vscode-languageclient/node";
import { clickedLine, outcome, previewHtml, runWithInput, stdinArgs } from "./cli";
import { commandTarget, ExtensionSettings, findRuntime, resolveServer, runtimeProblem, serverEnvironment, serverSettings } from "./config";
import { commandProblem, Notice, ServerState } from "./status";

let client: LanguageClient | undefined;
let output: vscode.OutputChannel;
/** Why the server is not running, when it failed to start or stopped for good; undefined while it runs. */
let stoppedBecause: string | undefined;

function serverState(): ServerState {
  return client?.isRunning() ? { running: true } : { running: false, reason: stoppedBecause };
}

/** Shows a notice; "Retry" starts the server again. */
function tell(notice: Notice, error = false): void {
  const show = error ? vscode.window.showErrorMessage : vscode.window.showInformationMessage;
  const actions = notice.retry ? ["Retry", "Show log"] : [];
  void show(notice.message, ...actions).then((choice) => {
    if (choice === "Retry") void vscode.commands.executeCommand("motorlang.restartServer");
    else if (choice === "Show log") output.show();
  });
}

function readSettings(): ExtensionSettings {
  const c = vscode.workspace.getConfiguration("motorlang");
  return {
    serverPath: c.get<string>("server.path", ""),
    dotnetPath: c.get<string>("dotnet.path", ""),
    inlayFullLoadCurrent: c.get<boolean>("inlayHints.fullLoadCurrent", true),
    inlayMinimumWire: c.get<boolean>("inlayHints.minimumWire", true),
    codeLens: c.get<boolean>("codeLens", true),
  };
}

/** The self-contained server's file name when this is a platform package that carries one, made executable if the unpacking lost its mode. */
function bundledExecutable(extensionPath: string): string | undefined {
  const name = process.platform === "win32" ? "motorlang.exe" : "motorlang";
  const file = path.join(extensionPath, "server", name);
  if (!fs.existsSync(file)) return undefined;
  if (process.platform !== "win32") {
    try {
      fs.accessSync(file, fs.constants.X_OK);
    } catch {
      fs.chmodSync(file, 0o755);
    }
  }
  return name;
}

function run(command: string, args: string[]): Promise<string> {
  return new Promise((resolve) => execFile(command, args, { timeout: 15000 }, (error, stdout) => resolve(error ? "" : stdout)));
}

async function start(context: vscode.ExtensionContext): Promise<void> {
  const settings = readSettings();
  const server = resolveServer(settings, context.extensionPath, vscode.workspace.isTrusted, bundledExecutable(context.extensionPath));
  if (server.command.endsWith("dotnet") || server.args[0]?.endsWith(".dll")) {
    const problem = runtimeProblem(findRuntime(await run(server.command, ["--list-runtimes"])), server.command);
    if (problem) {
      stoppedBecause = problem;
      tell({ message: problem, retry: true }, true);
      return;
    }
  }
  stoppedBecause = undefined;

  const serverOptions: ServerOptions = { command: server.command, args: server.args, transport: TransportKind.stdio, options: { env: serverEnvironment(process.env) } };
  let crashes = 0;
  const clientOptions: LanguageClientOptions = {
    documentSelector: [{ language: "motorlang" }],
    outputChannel: output,
    initializationOptions: serverSettings(settings),
    errorHandler: {
      error: () => ({ action: ErrorAction.Continue }),
      closed: () => {
        crashes++;
        if (crashes <= 4) return { action: CloseAction.Restart };
        stoppedBecause = "It stopped repeatedly; the MotorLang output channel has its log.";
        tell({ message: `The MotorLang server stopped repeatedly. See the MotorLang output channel for its log.`, retry: true }, true);
        return { action: CloseAction.DoNotRestart };
      },
    },
  };
  client = new LanguageClient("motorlang", "MotorLang", serverOptions, clientOptions);
  try {
    await client.start();
  } catch (e) {
    // A server path that does not exist or is not executable: say so, keep the editor usable.
    stoppedBecause = `It could not be started (${server.command}): ${e instanceof Error ? e.message : String(e)}`;
    tell({ message: `The MotorLang server could not be started. ${stoppedBecause}`, retry: true }, true);
  }
}

async function sizeEverything(arg: unknown): Promise<void> {
  const editor = vscode.window.activeTextEditor;
  const target = commandTarget(arg, editor?.document.uri.toString(), editor?.document.languageId);
  const problem = commandProblem(serverState(), editor ? target : undefined, "size it");
  if (problem || !target || !client) {
    if (problem) tell(problem, problem.retry);
    return;
  }
  // Asked of the server directly: it offers "size everything" without its edit and fills the edit
  // in on codeAction/resolve, since computing it re-analyses the whole list.
  const offered = await client.sendRequest<CodeAction[] | null>(CodeActionRequest.method, {
    textDocument: { uri: target },
    range: { start: { line: 0, character: 0 }, end: { line: 0, character: 0 } },
    context: { diagnostics: [], only: [CodeActionKind.SourceFixAll] },
  });
  let action = offered?.find((a) => a.kind === CodeActionKind.SourceFixAll);
  if (action && !action.edit) action = await client.sendRequest<CodeAction>(CodeActionResolveRequest.method, action);
  const edit = await client.protocol2CodeConverter.asWorkspaceEdit(action?.edit);
  if (!edit) {
    void vscode.window.showInformationMessage("Every size is already written.");
    return;
  }
  await vscode.workspace.applyEdit(edit);
}

/** The motor list a command works on, as the editor holds it (unsaved edits included); nothing is saved. */
async function targetDocument(arg: unknown, what: string): Promise<vscode.TextDocument | undefined> {
  const editor = vscode.window.activeTextEditor;
  const target = commandTarget(arg, editor?.document.uri.toString(), editor?.document.languageId);
  // The schedule and report come from the command line, but on the same runtime as the server:
  // when the server is not running, that is the problem to name.
  const problem = commandProblem(serverState(), target, `see its ${what}`);
  if (problem || !target) {
    if (problem) tell(problem, problem.retry);
    return undefined;
  }
  return vscode.workspace.openTextDocument(vscode.Uri.parse(target));
}

/** Runs a reporting command of the command line on the buffer's text, passed on standard input. */
async function runOnBuffer(context: vscode.ExtensionContext, document: vscode.TextDocument, command: string[]) {
  const server = resolveServer(readSettings(), context.extensionPath, vscode.workspace.isTrusted, bundledExecutable(context.extensionPath));
  const name = document.uri.scheme === "file" ? document.uri.fsPath : document.uri.toString();
  return outcome(await runWithInput(server.command, stdinArgs(server.args, command, name), document.getText(), 30000, serverEnvironment(process.env)));
}

async function showSchedule(context: vscode.ExtensionContext, arg: unknown): Promise<void> {
  const document = await targetDocument(arg, "schedule");
  if (!document) return;
  const result = await runOnBuffer(context, document, ["schedule", "--format", "markdown"]);
  if ("failure" in result) {
    void vscode.window.showErrorMessage(result.failure);
    return;
  }
  // A list with errors still has a schedule: show it, and say where the errors are.
  const note = result.hasErrors ? "> The list has errors (see the Problems panel); rows with errors name their codes under Status.\n\n" : "";
  const title = document.uri.scheme === "file" ? document.uri.fsPath : document.uri.toString();
  const shown = await vscode.workspace.openTextDocument({ language: "markdown", content: `# Schedule: ${title}\n\n${note}${result.text}` });
  await vscode.commands.executeCommand("markdown.showPreviewToSide", shown.uri);
}

/** One report preview per motor list, beside its editor, redrawn a moment after each edit. */
const previews = new Map<string, vscode.WebviewPanel>();

async function showReportPreview(context: vscode.ExtensionContext, arg: unknown): Promise<void> {
  const document = await targetDocument(arg, "report");
  if (!document) return;
  const key = document.uri.toString();
  const existing = previews.get(key);
  if (existing) {
    existing.reveal(vscode.ViewColumn.Beside, true);
    return;
  }
  const panel = vscode.window.createWebviewPanel("motorlang.report", `Report: ${document.uri.path.split("/").pop()}`,
    { viewColumn: vscode.ViewColumn.Beside, preserveFocus: true }, { enableScripts: true, localResourceRoots: [] });
  previews.set(key, panel);
  let timer: NodeJS.Timeout | undefined;
  let generation = 0;
  const render = async () => {
    const mine = ++generation;
    const current = vscode.workspace.textDocuments.find((d) => d.uri.toString() === key) ?? document;
    const result = await runOnBuffer(context, current, ["report"]);
    if (mine !== generation) return; // a later edit is already being drawn
    const nonce = Array.from({ length: 24 }, () => Math.floor(Math.random() * 36).toString(36)).join("");
    panel.webview.html = "failure" in result
      ? `<!DOCTYPE html><html><body><p>${result.failure.replace(/[<&]/g, (c) => (c === "<" ? "&lt;" : "&amp;"))}</p></body></html>`
      : previewHtml(result.text, nonce, panel.webview.cspSource);
  };
  const subscriptions = [
    vscode.workspace.onDidChangeTextDocument((e) => {
      if (e.document.uri.toString() !== key) return;
      if (timer) clearTimeout(timer);
      timer = setTimeout(() => void render(), 700);
    }),
    panel.webview.onDidReceiveMessage(async (message: unknown) => {
      const line = clickedLine(message);
      if (line === undefined) return;
      const target = await vscode.workspace.openTextDocument(vscode.Uri.parse(key));
      const editor = await vscode.window.showTextDocument(target, { viewColumn: vscode.ViewColumn.One, preserveFocus: false });
      const position = new vscode.Position(Math.min(line, target.lineCount - 1), 0);
      editor.selection = new vscode.Selection(position, position);
      editor.revealRange(new vscode.Range(position, position), vscode.TextEditorRevealType.InCenterIfOutsideViewport);
    }),
  ];
  panel.onDidDispose(() => {
    if (timer) clearTimeout(timer);
    subscriptions.forEach((d) => d.dispose());
    previews.delete(key);
  });
  await render();
}

export async function activate(context: vscode.ExtensionContext): Promise<void> {
  output = vscode.window.createOutputChannel("MotorLang");
  context.subscriptions.push(
    output,
    vscode.commands.registerCommand("motorlang.restartServer", async () => {
      // A client that never started (or stopped for good) may refuse to stop; it is replaced either way.
      await client?.stop().catch(() => undefined);
      client = undefined;
      await start(context);
    }),
    vscode.commands.registerCommand("motorlang.sizeEverything", sizeEverything),
    vscode.commands.registerCommand("motorlang.showSchedule", (arg: unknown) => showSchedule(context, arg)),
    vscode.commands.registerCommand("motorlang.showReportPreview", (arg: unknown) => showReportPreview(context, arg)),
    vscode.workspace.onDidChangeConfiguration(async (e) => {
      if (!e.affectsConfiguration("motorlang") || !client) return;
      if (e.affectsConfiguration("motorlang.server") || e.affectsConfiguration("motorlang.dotnet")) {
        await vscode.commands.executeCommand("motorlang.restartServer");
        return;
      }
      await client.sendNotification("workspace/didChangeConfiguration", { settings: serverSettings(readSettings()) });
    }),
  );
  await start(context);
}

export async function deactivate(): Promise<void> {
  await client?.stop();
}
