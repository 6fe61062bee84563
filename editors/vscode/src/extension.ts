import { execFile } from "child_process";
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
import { commandTarget, ExtensionSettings, findRuntime, resolveServer, runtimeProblem, serverEnvironment, serverSettings } from "./config";

let client: LanguageClient | undefined;
let output: vscode.OutputChannel;

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

function run(command: string, args: string[]): Promise<string> {
  return new Promise((resolve) => execFile(command, args, { timeout: 15000 }, (error, stdout) => resolve(error ? "" : stdout)));
}

async function start(context: vscode.ExtensionContext): Promise<void> {
  const settings = readSettings();
  const server = resolveServer(settings, context.extensionPath, vscode.workspace.isTrusted);
  if (server.command.endsWith("dotnet") || server.args[0]?.endsWith(".dll")) {
    const problem = runtimeProblem(findRuntime(await run(server.command, ["--list-runtimes"])), server.command);
    if (problem) {
      void vscode.window.showErrorMessage(problem);
      return;
    }
  }

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
        void vscode.window.showErrorMessage("The MotorLang server stopped repeatedly. See the MotorLang output channel for its log.", "Show log")
          .then((choice) => choice && output.show());
        return { action: CloseAction.DoNotRestart };
      },
    },
  };
  client = new LanguageClient("motorlang", "MotorLang", serverOptions, clientOptions);
  await client.start();
}

async function sizeEverything(arg: unknown): Promise<void> {
  const editor = vscode.window.activeTextEditor;
  const target = commandTarget(arg, editor?.document.uri.toString(), editor?.document.languageId);
  if (!target || !editor || !client) {
    void vscode.window.showInformationMessage("Open a .motors file to size it.");
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

async function showSchedule(context: vscode.ExtensionContext, arg: unknown): Promise<void> {
  const editor = vscode.window.activeTextEditor;
  const target = commandTarget(arg, editor?.document.uri.toString(), editor?.document.languageId);
  if (!target) {
    void vscode.window.showInformationMessage("Open a .motors file to see its schedule.");
    return;
  }
  const uri = vscode.Uri.parse(target);
  const document = await vscode.workspace.openTextDocument(uri);
  if (document.isDirty) await document.save();
  const server = resolveServer(readSettings(), context.extensionPath, vscode.workspace.isTrusted);
  const args = [...server.args.slice(0, -1), "schedule", "--format", "markdown", uri.fsPath];
  const markdown = await run(server.command, args);
  const shown = await vscode.workspace.openTextDocument({ language: "markdown", content: `# Schedule: ${uri.fsPath}\n\n${markdown}` });
  await vscode.commands.executeCommand("markdown.showPreviewToSide", shown.uri);
}

export async function activate(context: vscode.ExtensionContext): Promise<void> {
  output = vscode.window.createOutputChannel("MotorLang");
  context.subscriptions.push(
    output,
    vscode.commands.registerCommand("motorlang.restartServer", async () => {
      await client?.stop();
      client = undefined;
      await start(context);
    }),
    vscode.commands.registerCommand("motorlang.sizeEverything", sizeEverything),
    vscode.commands.registerCommand("motorlang.showSchedule", (arg: unknown) => showSchedule(context, arg)),
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
