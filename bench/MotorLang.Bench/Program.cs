using BenchmarkDotNet.Running;
using MotorLang.Bench;

// Quick modes (see bench/README.md); anything else runs the BenchmarkDotNet benchmarks.
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
    case ["parses" or "analyses", var n]:
        QuickTiming.Repeat(args[0], int.Parse(n));
        break;
    case ["updates", var n]:
        QuickTiming.Updates(int.Parse(n));
        break;
    case ["hovers", var n]:
        HoverTiming.Run(int.Parse(n));
        break;
    case ["edits", var n]:
        await ServerTiming.Edits(int.Parse(n));
        break;
    case ["memory", var n]:
        MemoryReports.Retained(int.Parse(n));
        break;
    case ["process", var n, var motorlang]:
        await MemoryReports.Process(int.Parse(n), motorlang);
        break;
    case ["typing", var n, var motorlang, ..]:
        await TypingSession.Typing(int.Parse(n), motorlang, values: args.Contains("values"),
            debounceMs: args.Skip(3).FirstOrDefault(a => a.All(char.IsAsciiDigit)) is { } ms ? int.Parse(ms) : 150);
        break;
    case ["paste", var n, var motorlang]:
        await TypingSession.Paste(int.Parse(n), motorlang);
        break;
    case ["open", var megabytes, var motorlang]:
        await LargeOpen.Run(int.Parse(megabytes), motorlang);
        break;
    case ["generate-plant", var files, var motors, var folder]:
        Directory.CreateDirectory(folder);
        PlantTiming.Write(folder, int.Parse(files), int.Parse(motors));
        break;
    case ["plant", var files, var motors, var motorlang]:
        await PlantTiming.Run(int.Parse(files), int.Parse(motors), motorlang);
        break;
    case ["hostile", var motorlang, ..]:
        HostileLists.Run(motorlang, args.Length > 2 ? int.Parse(args[2]) : 1);
        break;
    default:
        BenchmarkSwitcher.FromAssembly(typeof(ParseAndFormatBenchmarks).Assembly).Run(args);
        break;
}
