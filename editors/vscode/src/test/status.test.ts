import assert from "node:assert/strict";
import { test } from "node:test";
import { commandProblem, notRunning } from "../status";

test("a command with the server stopped says so, with the reason, and offers a retry", () => {
  const state = { running: false as const, reason: "MotorLang needs the .NET 10 runtime." };
  assert.deepEqual(commandProblem(state, "file:///a.motors", "size it"), {
    message: "The MotorLang server is not running. MotorLang needs the .NET 10 runtime.",
    retry: true,
  });
  // Not "Open a .motors file": with no file open either, the server is still the problem to name.
  assert.match(commandProblem(state, undefined, "size it")!.message, /^The MotorLang server is not running/);
});

test("a stopped server with no known reason is still named", () => {
  assert.deepEqual(notRunning({ running: false }), { message: "The MotorLang server is not running.", retry: true });
});

test("with the server running, a missing motor list is the problem, and no retry is offered", () => {
  assert.deepEqual(commandProblem({ running: true }, undefined, "see its schedule"), { message: "Open a .motors file to see its schedule.", retry: false });
  assert.equal(commandProblem({ running: true }, "file:///a.motors", "see its schedule"), undefined);
});
