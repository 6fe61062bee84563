// The extension's own logic, free of the 'vscode' module so it can be unit tested with node's test runner.
import * as path from "path";

/** The settings the extension reads; installation settings are never here, they live in the motor list. */
export interface ExtensionSettings {
  serverPath: string;
  dotnetPath: string;
  inlayFullLoadCurrent: boolean;
  inlayMinimumWire: boolean;
  codeLens: boolean;
}

/** How to start the server: an executable and its arguments. */
export interface ServerCommand {
  command: string;
  args: string[];
}

/**
 * Chooses the server to run. A configured path is honoured only in a trusted workspace (a workspace
 * could otherwise make the editor run any program); otherwise the server bundled in the extension:
 * its self-contained executable (`bundledExecutable`, the file name, in a platform package) or its
 * assemblies run by the installed runtime (the universal package).
 * A .dll runs through dotnet; anything else is run directly (a published executable).
 */
export function resolveServer(settings: ExtensionSettings, extensionDir: string, trusted: boolean, bundledExecutable?: string): ServerCommand {
  const configured = trusted ? settings.serverPath.trim() : "";
  // A platform package carries the server as one self-contained executable: it needs no runtime.
  if (!configured && bundledExecutable) return { command: path.join(extensionDir, "server", bundledExecutable), args: ["lsp"] };
  const dotnet = (trusted && settings.dotnetPath.trim()) || "dotnet";
  const server = configured || path.join(extensionDir, "server", "motorlang.dll");
  return server.toLowerCase().endsWith(".dll")
    ? { command: dotnet, args: [server, "lsp"] }
    : { command: server, args: ["lsp"] };
}

/**
 * The server's environment: the editor's, with the .NET runtime's diagnostics socket and debugger
 * pipes turned off (DOTNET_EnableDiagnostics=0) unless the user set the variable, e.g. to 1 for profiling.
 */
export function serverEnvironment(env: Record<string, string | undefined>): Record<string, string | undefined> {
  return "DOTNET_EnableDiagnostics" in env ? { ...env } : { ...env, DOTNET_EnableDiagnostics: "0" };
}

/** The initialization options and configuration the server understands (presentation only). */
export function serverSettings(settings: ExtensionSettings): { motorlang: object } {
  return {
    motorlang: {
      inlayHints: { fullLoadCurrent: settings.inlayFullLoadCurrent, minimumWire: settings.inlayMinimumWire },
      codeLens: settings.codeLens,
    },
  };
}

/** The .NET major version the server needs. */
export const requiredDotnetMajor = 10;

/**
 * Reads `dotnet --list-runtimes` output and says whether a Microsoft.NETCore.App runtime of at least
 * the required major version is installed; returns the best version found, or undefined.
 */
export function findRuntime(listRuntimesOutput: string): { version: string; sufficient: boolean } | undefined {
  const versions = listRuntimesOutput
    .split(/\r?\n/)
    .map((line) => /^Microsoft\.NETCore\.App (\d+)\.(\d+)\.(\d+)\S*/.exec(line.trim()))
    .filter((m): m is RegExpExecArray => m !== null)
    .map((m) => ({ version: `${m[1]}.${m[2]}.${m[3]}`, major: Number(m[1]), minor: Number(m[2]), patch: Number(m[3]) }))
    .sort((a, b) => b.major - a.major || b.minor - a.minor || b.patch - a.patch);
  const best = versions[0];
  return best && { version: best.version, sufficient: best.major >= requiredDotnetMajor };
}

/** The message shown when the runtime is missing or too old: what to install, not a stack trace. */
export function runtimeProblem(found: { version: string; sufficient: boolean } | undefined, dotnet: string): string | undefined {
  if (found === undefined) {
    return `MotorLang needs the .NET ${requiredDotnetMajor} runtime, and '${dotnet}' was not found or lists no runtime. ` +
      `Install .NET ${requiredDotnetMajor} (https://dot.net) or set 'motorlang.dotnet.path'.`;
  }
  if (!found.sufficient) {
    return `MotorLang needs the .NET ${requiredDotnetMajor} runtime; the newest found is ${found.version}. Install .NET ${requiredDotnetMajor} (https://dot.net).`;
  }
  return undefined;
}

/**
 * The file a command acts on: an explicit URI argument (from a code lens or a context menu), else
 * the active editor's document when it is a motor list.
 */
export function commandTarget(arg: unknown, activeUri: string | undefined, activeLanguage: string | undefined): string | undefined {
  if (typeof arg === "string" && arg.length > 0) return arg;
  if (arg !== null && typeof arg === "object" && "toString" in arg && String(arg).includes(":")) return String(arg);
  return activeLanguage === "motorlang" ? activeUri : undefined;
}
