using BenchmarkDotNet.Running;
using MotorLang.Bench;

// `generate N [file]` writes a synthetic list; anything else runs the benchmarks.
if (args is ["generate", var count, ..])
{
    var text = MotorListGenerator.Generate(int.Parse(count));
    if (args.Length > 2) File.WriteAllText(args[2], text);
    else Console.Out.Write(text);
    return;
}

BenchmarkSwitcher.FromAssembly(typeof(ParseAndFormatBenchmarks).Assembly).Run(args);
