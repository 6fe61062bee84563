using BenchmarkDotNet.Running;
using MotorLang.Bench;

// `generate N [file]` writes a synthetic list; `time N` gives a quick look; anything else runs the benchmarks.
switch (args)
{
    case ["generate", var count, ..]:
        var text = MotorListGenerator.Generate(int.Parse(count));
        if (args.Length > 2) File.WriteAllText(args[2], text);
        else Console.Out.Write(text);
        break;
    case ["time", var n]:
        QuickTiming.Run(int.Parse(n));
        break;
    case ["process", var n, var motorlang]:
        await QuickTiming.ServerProcessMemory(int.Parse(n), motorlang);
        break;
    case ["parses", var n]:
        QuickTiming.Parses(int.Parse(n));
        break;
    case ["analyses", var n]:
        QuickTiming.Analyses(int.Parse(n));
        break;
    case ["updates", var n]:
        QuickTiming.Updates(int.Parse(n));
        break;
    case ["edits", var n]:
        await QuickTiming.ServerEdits(int.Parse(n));
        break;
    case ["memory", var n]:
        await QuickTiming.ServerMemory(int.Parse(n));
        break;
    default:
        BenchmarkSwitcher.FromAssembly(typeof(ParseAndFormatBenchmarks).Assembly).Run(args);
        break;
}
