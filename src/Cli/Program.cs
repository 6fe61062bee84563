using MotorLang.Cli;

DiagnosticEndpoints.RemoveUnlessRequested();
return CommandLine.Run(args, Console.Out, Console.Error, MotorLang.Cli.Usage.CliEnvironment.FromProcess());
