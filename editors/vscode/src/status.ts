// What a command says when it cannot run, free of the 'vscode' module so node's test runner can check it.

/** Whether the language server is running, and if not, why (the message shown when it stopped or never started). */
export type ServerState = { running: true } | { running: false; reason?: string };

/** A message for the user and whether offering "Retry" (start the server again) makes sense. */
export interface Notice {
  message: string;
  retry: boolean;
}

/** The notice for a server that is not running: that, and why when it is known, never "open a file". */
export function notRunning(state: ServerState): Notice | undefined {
  if (state.running) return undefined;
  const why = state.reason ? ` ${state.reason}` : "";
  return { message: `The MotorLang server is not running.${why}`, retry: true };
}

/**
 * Why a command on a motor list cannot run, or undefined when it can: first a server that is not
 * running (opening another file would not help), then no motor list to act on.
 */
export function commandProblem(state: ServerState, target: string | undefined, what: string): Notice | undefined {
  return notRunning(state) ?? (target === undefined ? { message: `Open a .motors file to ${what}.`, retry: false } : undefined);
}
