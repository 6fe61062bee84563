using System.CommandLine;
using MotorLang.Server;

namespace MotorLang.Cli;

/// <summary>`motorlang lsp`: the language server on stdin/stdout. Its log goes to stderr; stdout carries only protocol messages.</summary>
public static class LspCommand
{
    public static Command Create()
    {
        var debounce = new Option<int>("--debounce-ms") { Description = "Wait this long after typing stops before analyzing", DefaultValueFactory = _ => 150 };
        var command = new Command("lsp", "Run the language server over stdin and stdout") { debounce };
        command.SetAction(async (result, _) =>
        {
            using var stdin = Console.OpenStandardInput();
            using var stdout = Console.OpenStandardOutput();
            return await LanguageServer.RunAsync(stdin, stdout, Console.Error, TimeSpan.FromMilliseconds(result.GetValue(debounce)));
        });
        return command;
    }
}
