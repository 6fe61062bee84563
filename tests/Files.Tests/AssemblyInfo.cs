// The tests build special files (FIFOs, hard links, owners, modes, a tmpfs): they are Linux tests.
[assembly: System.Runtime.Versioning.UnsupportedOSPlatform("windows")]

// AtomicWriterTests replace the writer's temporary-name source, a static shared by every writer.
[assembly: CollectionBehavior(DisableTestParallelization = true)]
