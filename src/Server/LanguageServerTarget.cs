using System.Diagnostics;
using MotorLang.Analysis.Editing;
using MotorLang.Analysis.Fixes;
using MotorLang.Analysis.Plant;
using MotorLang.Parser.Formatting;
using MotorLang.Parser.Text;
using MotorLang.Server.Documents;
using MotorLang.Server.Features;
using MotorLang.Server.Plants;
using MotorLang.Server.Protocol;
using MotorLang.Server.Transport;
using StreamJsonRpc;
using Convert = MotorLang.Server.Features.Convert;
using LspRange = MotorLang.Server.Protocol.Range;

namespace MotorLang.Server;

/// <summary>
/// The protocol handlers. Each one translates protocol types to Analysis calls and back; no sizing
/// or parsing logic lives here. Document notifications mutate the store synchronously (in arrival
/// order); requests read an immutable snapshot off the reader thread, honour cancellation, and
/// answer ContentModified when the document changed underneath them.
/// </summary>
public sealed class LanguageServerTarget
{
    private const string Single = "";
    private readonly DocumentStore _store = new();
    private readonly PlantService _plants;
    private readonly DiagnosticScheduler _diagnostics;
    private readonly WorkspaceIndex _workspace;
    private readonly ServerLog _log;
    private readonly MemoryTrimmer _trimmer;
    private readonly TaskCompletionSource<int> _exit = new(TaskCreationOptions.RunContinuationsAsynchronously);
    private readonly ProtocolLifecycle _lifecycle;
    private PresentationSettings _presentation = new();

    /// <summary>Whether the client asks for a code action's edit only when the user picks it (codeAction/resolve).</summary>
    private bool _resolvesEdits;

    /// <summary>Whether the client lets the server ask it to watch *.motors files (for the plants' closed files).</summary>
    private bool _watchesFiles;

    private readonly JsonRpc _rpc;

    internal LanguageServerTarget(JsonRpc rpc, ServerLog log, ProtocolLifecycle lifecycle, TimeSpan debounce)
    {
        _log = log;
        _rpc = rpc;
        _lifecycle = lifecycle;
        _workspace = new WorkspaceIndex(_store);
        _plants = new PlantService(_store);
        _trimmer = new MemoryTrimmer(TimeSpan.FromSeconds(2), 48L << 20, m => _log.Info(m));
        _diagnostics = new DiagnosticScheduler(p =>
        {
            _trimmer.Touch();
            return rpc.NotifyWithParameterObjectAsync("textDocument/publishDiagnostics", p);
        }, debounce, m => _log.Error(m), AnalyseForDiagnostics, ReanalyseIfOpen);
    }

    /// <summary>Completes with the process exit code once 'exit' arrives or the client process dies.</summary>
    public Task<int> Exited => _exit.Task;

    // ---- lifecycle ----

    [JsonRpcMethod("initialize", UseSingleObjectParameterDeserialization = true)]
    public InitializeResult Initialize(InitializeParams p)
    {
        _workspace.SetRoot(p.RootUri);
        _presentation = PresentationSettings.From(p.InitializationOptions);
        _resolvesEdits = ClientCapabilities.ResolvesCodeActionEdits(p.Capabilities);
        _watchesFiles = ClientCapabilities.RegistersFileWatchers(p.Capabilities);
        if (p.ProcessId is { } pid) WatchClient(pid);
        _log.Info($"initialize from {p.ClientInfo?.Name ?? "unknown client"} (process {p.ProcessId?.ToString() ?? "none"})");
        var version = typeof(LanguageServerTarget).Assembly.GetName().Version?.ToString() ?? "0";
        return new InitializeResult(new ServerCapabilities(
            PositionEncoding: "utf-16",
            TextDocumentSync: new TextDocumentSyncOptions(OpenClose: true, Change: 2, Save: new SaveOptions(false)),
            HoverProvider: true,
            CompletionProvider: new CompletionOptions([" "], false),
            CodeActionProvider: new CodeActionOptions(["quickfix", "source.fixAll"], ResolveProvider: true),
            DocumentFormattingProvider: true,
            DocumentRangeFormattingProvider: true,
            DocumentSymbolProvider: true,
            WorkspaceSymbolProvider: true,
            FoldingRangeProvider: true,
            InlayHintProvider: true,
            CodeLensProvider: new CodeLensOptions(false),
            RenameProvider: new RenameOptions(true),
            ReferencesProvider: true,
            DefinitionProvider: true,
            SemanticTokensProvider: new SemanticTokensOptions(new SemanticTokensLegend(SemanticTokenEncoder.Legend, []), Full: true, Range: false)),
            new ServerInfo("motorlang", version));
    }

    [JsonRpcMethod("initialized")]
    public void Initialized()
    {
        if (!_watchesFiles) return;
        // A plant's closed files are read from disk: ask the client to say when any list changes there.
        var registration = new { registrations = new[] { new { id = "motorlang-watch-lists", method = "workspace/didChangeWatchedFiles",
            registerOptions = new { watchers = new[] { new { globPattern = "**/*" + PlantService.Extension } } } } } };
        _ = Task.Run(async () =>
        {
            try
            {
                await _rpc.InvokeWithParameterObjectAsync("client/registerCapability", registration);
            }
            catch (Exception e)
            {
                _log.Warn($"the client did not register the file watcher: {e.Message}");
            }
        });
    }

    /// <summary>The transport has already marked the lifecycle as shut down, in arrival order, and refuses later requests.</summary>
    [JsonRpcMethod("shutdown")]
    public object? Shutdown() => null;

    [JsonRpcMethod("exit")]
    public void Exit() => _exit.TrySetResult(_lifecycle.ShutdownRequested ? 0 : 1);

    [JsonRpcMethod("$/setTrace", UseSingleObjectParameterDeserialization = true)]
    public void SetTrace(SetTraceParams p) => Notify(() => _log.Trace = p.Value);

    [JsonRpcMethod("workspace/didChangeConfiguration", UseSingleObjectParameterDeserialization = true)]
    public void DidChangeConfiguration(DidChangeConfigurationParams p) => Notify(() => _presentation = PresentationSettings.From(p.Settings));

    // ---- documents: applied synchronously, in arrival order ----

    [JsonRpcMethod("textDocument/didOpen", UseSingleObjectParameterDeserialization = true)]
    public void DidOpen(DidOpenTextDocumentParams p) =>
        Notify(() => _diagnostics.Schedule(_store.Open(p.TextDocument.Uri, p.TextDocument.Version, p.TextDocument.Text)));

    [JsonRpcMethod("textDocument/didChange", UseSingleObjectParameterDeserialization = true)]
    public void DidChange(DidChangeTextDocumentParams p) => Notify(() =>
    {
        var snapshot = _store.Change(p.TextDocument.Uri, p.TextDocument.Version, p.ContentChanges);
        if (snapshot is null) _log.Warn($"didChange for {p.TextDocument.Uri}, which is not open");
        else _diagnostics.Schedule(snapshot);
    });

    [JsonRpcMethod("textDocument/didClose", UseSingleObjectParameterDeserialization = true)]
    public void DidClose(DidCloseTextDocumentParams p) => Notify(() =>
    {
        _store.Close(p.TextDocument.Uri);
        _ = _diagnostics.ClosedAsync(p.TextDocument.Uri);
    });

    /// <summary>
    /// Files changed on disk (the client watches *.motors): closed files of a plant are read again
    /// and every open document analysed again, so a plant's diagnostics follow a file saved,
    /// created or deleted outside the editor.
    /// </summary>
    [JsonRpcMethod("workspace/didChangeWatchedFiles", UseSingleObjectParameterDeserialization = true)]
    public void DidChangeWatchedFiles(DidChangeWatchedFilesParams p) => Notify(() =>
    {
        _plants.DiskChanged();
        foreach (var d in _store.All) _diagnostics.Schedule(d);
    });

    [JsonRpcMethod("textDocument/didSave", UseSingleObjectParameterDeserialization = true)]
    public void DidSave(DidSaveTextDocumentParams p)
    {
        // Nothing to do: the motor list itself holds every setting, and the open text is already analyzed.
    }

    // ---- requests: read a snapshot ----

    [JsonRpcMethod("textDocument/hover", UseSingleObjectParameterDeserialization = true)]
    public Task<Hover?> Hover(TextDocumentPositionParams p, CancellationToken ct) => Read(p.TextDocument.Uri, ct, s =>
        (InPlant(s, ct) is { } plant ? PlantBreakdown.At(plant.View.Analysis, plant.Name, Convert.FromLsp(p.Position)) : Breakdown.At(s.Analysis, Convert.FromLsp(p.Position))) is { } view
            ? new Hover(new MarkupContent("markdown", HoverRenderer.Markdown(view)), Convert.ToLsp(view.Range))
            : null);

    [JsonRpcMethod("textDocument/completion", UseSingleObjectParameterDeserialization = true)]
    public Task<CompletionList?> Completion(CompletionParams p, CancellationToken ct) => Read(p.TextDocument.Uri, ct, s =>
        new CompletionList(false, Analysis.Editing.Completion.At(s.Analysis, Convert.FromLsp(p.Position)).Select(c => new CompletionItem(
            c.Label, c.Kind switch { CompletionKind.Keyword => 14, CompletionKind.Reference => 18, _ => 12 }, c.Detail,
            c.Documentation is null ? null : new MarkupContent("markdown", c.Documentation), c.SortText)).ToArray()));

    [JsonRpcMethod("textDocument/codeAction", UseSingleObjectParameterDeserialization = true)]
    public Task<CodeAction[]?> CodeAction(CodeActionParams p, CancellationToken ct) => Read(p.TextDocument.Uri, ct, s =>
    {
        var uri = p.TextDocument.Uri;
        var range = new SourceRange(Convert.FromLsp(p.Range.Start), Convert.FromLsp(p.Range.End));
        var wanted = p.Context.Only;
        bool Allowed(string kind) => wanted is null || wanted.Any(w => kind == w || kind.StartsWith(w + ".", StringComparison.Ordinal));
        var actions = new List<CodeAction>();
        if (_plants.Of(s, ct) is { } plant)
        {
            // A file of a plant: the plant's findings and fixes, as its diagnostics show them.
            if (Allowed("quickfix")) actions.AddRange(PlantActions.QuickFixes(plant, uri, range));
            if (Allowed("source.fixAll") && PlantActions.HasFixes(plant))
            {
                if (_resolvesEdits) actions.Add(new CodeAction(SizeEverythingTitle, "source.fixAll", null, null, null, new CodeActionData(uri, s.Version)));
                else if (PlantActions.SizeEverything(plant) is { } edit) actions.Add(new CodeAction(SizeEverythingTitle, "source.fixAll", null, null, edit));
            }

            return actions.ToArray();
        }

        if (Allowed("quickfix"))
        {
            foreach (var f in s.Analysis.Findings.Where(f => f.Fix is not null && Overlaps(f.Range, range)))
                actions.Add(new CodeAction(f.Fix!.Title, "quickfix", [Convert.ToLsp(f, uri)], true, Edit(uri, f.Fix.Edits.Select(Convert.ToLsp))));
        }

        if (Allowed("source.fixAll") && s.Analysis.Findings.Any(f => f.Fix is not null))
        {
            // Sizing everything re-analyses the document a few times: a client that can resolve
            // actions gets the edit only when the user picks this one, not on every cursor move.
            if (_resolvesEdits) actions.Add(new CodeAction(SizeEverythingTitle, "source.fixAll", null, null, null, new CodeActionData(uri, s.Version)));
            else if (SizeEverything(s) is { } action) actions.Add(action);
        }

        return actions.ToArray();
    });

    [JsonRpcMethod("codeAction/resolve", UseSingleObjectParameterDeserialization = true)]
    public Task<CodeAction?> ResolveCodeAction(CodeAction action, CancellationToken ct)
    {
        if (action.Data is not { } data) return Task.FromResult<CodeAction?>(action);
        return Read(data.Uri, ct, s =>
        {
            if (s.Version != data.Version)
                throw new LocalRpcException("the document changed since this action was offered") { ErrorCode = ErrorCodes.ContentModified };
            if (_plants.Of(s, ct) is { } plant)
                return action with { Edit = PlantActions.SizeEverything(plant) ?? new WorkspaceEdit(new() { [data.Uri] = [] }) };
            return SizeEverything(s) ?? action with { Edit = new WorkspaceEdit(new() { [data.Uri] = [] }) };
        });
    }

    private const string SizeEverythingTitle = "Size everything: write every required size";

    private static CodeAction? SizeEverything(DocumentSnapshot s)
    {
        var sized = SizeAll.Apply(s.Text);
        return sized == s.Text ? null : new CodeAction(SizeEverythingTitle, "source.fixAll", null, null, Edit(s.Uri, [WholeDocument(s, sized)]));
    }

    [JsonRpcMethod("textDocument/formatting", UseSingleObjectParameterDeserialization = true)]
    public Task<Protocol.TextEdit[]?> Formatting(DocumentFormattingParams p, CancellationToken ct) => Read(p.TextDocument.Uri, ct, s =>
        Formatter.Format(s.Parse).Edits.Select(Convert.ToLsp).ToArray());

    [JsonRpcMethod("textDocument/rangeFormatting", UseSingleObjectParameterDeserialization = true)]
    public Task<Protocol.TextEdit[]?> RangeFormatting(DocumentRangeFormattingParams p, CancellationToken ct) => Read(p.TextDocument.Uri, ct, s =>
    {
        // A range ending at column 0 of a line does not include that line.
        var last = p.Range.End.Character == 0 && p.Range.End.Line > p.Range.Start.Line ? p.Range.End.Line - 1 : p.Range.End.Line;
        return Formatter.Format(s.Parse, p.Range.Start.Line, last).Edits.Select(Convert.ToLsp).ToArray();
    });

    [JsonRpcMethod("textDocument/documentSymbol", UseSingleObjectParameterDeserialization = true)]
    public Task<DocumentSymbol[]?> DocumentSymbol(DocumentSymbolParams p, CancellationToken ct) => Read(p.TextDocument.Uri, ct, s =>
        Outline.Of(s.Parse).Select(ToSymbol).ToArray());

    [JsonRpcMethod("workspace/symbol", UseSingleObjectParameterDeserialization = true)]
    public Task<SymbolInformation[]> WorkspaceSymbol(WorkspaceSymbolParams p, CancellationToken ct) =>
        Run(() => _workspace.Search(p.Query, ct).ToArray(), ct);

    [JsonRpcMethod("textDocument/foldingRange", UseSingleObjectParameterDeserialization = true)]
    public Task<FoldingRange[]?> FoldingRange(FoldingRangeParams p, CancellationToken ct) => Read(p.TextDocument.Uri, ct, s =>
        Folding.Of(s.Parse).Select(r => new FoldingRange(r.StartLine, r.EndLine, r.Comment ? "comment" : "region")).ToArray());

    [JsonRpcMethod("textDocument/inlayHint", UseSingleObjectParameterDeserialization = true)]
    public Task<InlayHint[]?> InlayHint(InlayHintParams p, CancellationToken ct) => Read(p.TextDocument.Uri, ct, s =>
    {
        var settings = _presentation;
        if (!settings.InlayFlc && !settings.InlayWire) return [];
        if (InPlant(s, ct) is { } plant)
        {
            return PlantBreakdown.MotorsOnLines(plant.View.Analysis, plant.Name, p.Range.Start.Line, p.Range.End.Line)
                .Select(x => (x.Line, x.Motor, label: Breakdown.InlaySummary(x.Motor, settings.InlayFlc, settings.InlayWire)))
                .Where(x => x.label is not null)
                .Select(x => new InlayHint(new Position(x.Line, x.Motor.Motor.Header.Line.Length), x.label!, null, true))
                .ToArray();
        }

        return Breakdown.MotorsOnLines(s.Analysis, p.Range.Start.Line, p.Range.End.Line)
            .Select(m => (m, label: Breakdown.InlaySummary(m, settings.InlayFlc, settings.InlayWire)))
            .Where(x => x.label is not null)
            .Select(x => new InlayHint(new Position(x.m.Motor.Header.Line.Index, x.m.Motor.Header.Line.Length), x.label!, null, true))
            .ToArray();
    });

    [JsonRpcMethod("textDocument/codeLens", UseSingleObjectParameterDeserialization = true)]
    public Task<CodeLens[]?> CodeLens(CodeLensParams p, CancellationToken ct) => Read(p.TextDocument.Uri, ct, s =>
        !_presentation.CodeLens
            ? []
            : InPlant(s, ct) is { } plant
            ? PlantBreakdown.Feeders(plant.View.Analysis, plant.Name).Select(f => new CodeLens(Convert.ToLsp(f.Header),
                new Command(Breakdown.FeederSummary(f.Feeder, plant.View.Analysis.Joined?.Power), "motorlang.showSchedule", [p.TextDocument.Uri]))).ToArray()
            : s.Analysis.Feeders.Values.OrderBy(f => f.Feeder.Header.Line.Index).Select(f => new CodeLens(Convert.ToLsp(f.Feeder.Header.Range),
                new Command(Breakdown.FeederSummary(f, s.Analysis.Power), "motorlang.showSchedule", [p.TextDocument.Uri]))).ToArray());

    [JsonRpcMethod("textDocument/definition", UseSingleObjectParameterDeserialization = true)]
    public Task<Location?> Definition(TextDocumentPositionParams p, CancellationToken ct) => Read(p.TextDocument.Uri, ct, s =>
    {
        if (InPlant(s, ct) is { } plant)
            return PlantTags.At(plant.View.Analysis, plant.Name, Convert.FromLsp(p.Position)) is { Definition: { } pd } ? plant.Location(pd) : null;
        return Tags.At(s.Parse, Convert.FromLsp(p.Position)) is { Definition: { } d } ? new Location(p.TextDocument.Uri, Convert.ToLsp(d)) : null;
    });

    [JsonRpcMethod("textDocument/references", UseSingleObjectParameterDeserialization = true)]
    public Task<Location[]?> References(ReferenceParams p, CancellationToken ct) => Read(p.TextDocument.Uri, ct, s =>
    {
        if (InPlant(s, ct) is { } plant)
        {
            if (PlantTags.At(plant.View.Analysis, plant.Name, Convert.FromLsp(p.Position)) is not { } found) return [];
            return (p.Context?.IncludeDeclaration == false ? found.References : found.All).Select(plant.Location).ToArray();
        }

        if (Tags.At(s.Parse, Convert.FromLsp(p.Position)) is not { } tag) return [];
        var ranges = p.Context?.IncludeDeclaration == false ? tag.References : tag.All;
        return ranges.Select(r => new Location(p.TextDocument.Uri, Convert.ToLsp(r))).ToArray();
    });

    [JsonRpcMethod("textDocument/prepareRename", UseSingleObjectParameterDeserialization = true)]
    public Task<PrepareRenameResult?> PrepareRename(TextDocumentPositionParams p, CancellationToken ct) => Read(p.TextDocument.Uri, ct, s =>
    {
        var at = Convert.FromLsp(p.Position);
        if (InPlant(s, ct) is { } plant)
        {
            return PlantTags.At(plant.View.Analysis, plant.Name, at) is { } found && PlantTags.RangeAt(plant.View.Analysis, plant.Name, at) is { } r
                ? new PrepareRenameResult(Convert.ToLsp(r), found.Tag)
                : null;
        }

        if (Tags.At(s.Parse, at) is not { } tag) return null;
        var range = tag.All.First(r => r.Contains(at));
        return new PrepareRenameResult(Convert.ToLsp(range), tag.Tag);
    });

    /// <summary>Renames a tag where it is defined and wherever 'from' or 'like' names it; in a plant, in every file (one WorkspaceEdit).</summary>
    [JsonRpcMethod("textDocument/rename", UseSingleObjectParameterDeserialization = true)]
    public Task<WorkspaceEdit?> Rename(RenameParams p, CancellationToken ct) => Read(p.TextDocument.Uri, ct, s =>
    {
        if (InPlant(s, ct) is { } plant)
        {
            var (plantEdits, plantError) = PlantTags.Rename(plant.View.Analysis, plant.Name, Convert.FromLsp(p.Position), p.NewName);
            if (plantError is not null) throw new LocalRpcException(plantError) { ErrorCode = ErrorCodes.RequestFailed };
            return new WorkspaceEdit(plantEdits!.GroupBy(e => plant.UriOf(e.File), StringComparer.Ordinal)
                .ToDictionary(g => g.Key, g => g.Select(e => Convert.ToLsp(e.Edit)).ToArray(), StringComparer.Ordinal));
        }

        var (edits, error) = Tags.Rename(s.Parse, Convert.FromLsp(p.Position), p.NewName);
        if (error is not null) throw new LocalRpcException(error) { ErrorCode = ErrorCodes.RequestFailed };
        return Edit(p.TextDocument.Uri, edits!.Select(Convert.ToLsp));
    });

    [JsonRpcMethod("textDocument/semanticTokens/full", UseSingleObjectParameterDeserialization = true)]
    public Task<SemanticTokens?> SemanticTokens(SemanticTokensParams p, CancellationToken ct) => Read(p.TextDocument.Uri, ct, s =>
        new SemanticTokens(SemanticTokenEncoder.Encode(Classifier.Classify(s.Parse))));

    /// <summary>Debug request: the server's copy of a document, to check that incremental edits were applied faithfully.</summary>
    [JsonRpcMethod("motorlang/documentText", UseSingleObjectParameterDeserialization = true)]
    public DocumentTextResult? DocumentText(TextDocumentIdentifier p) =>
        _store.Get(p.Uri) is { } s ? new DocumentTextResult(s.Version, s.Text) : null;

    /// <summary>Debug request: the managed heap after a full collection, in bytes, for memory measurements.</summary>
    [JsonRpcMethod("motorlang/heapBytes")]
    public long HeapBytes() => GC.GetTotalMemory(forceFullCollection: true);

    /// <summary>Debug: what the collector holds from the system (committed) against what is in use, without collecting.</summary>
    [JsonRpcMethod("motorlang/gcMemory")]
    public object GcMemory()
    {
        var info = GC.GetGCMemoryInfo();
        return new { committed = info.TotalCommittedBytes, heap = info.HeapSizeBytes, fragmented = info.FragmentedBytes, gen0Budget = info.GenerationInfo[0].SizeAfterBytes };
    }

    // ---- helpers ----

    /// <summary>A document on its own, or the whole plant it belongs to (with its open buffers in place of their files).</summary>
    private DiagnosticBatch AnalyseForDiagnostics(DocumentSnapshot s, CancellationToken ct) =>
        _plants.Of(s, ct) is { } plant ? Features.Diagnostics.Plant(plant) : Features.Diagnostics.Single(s);

    /// <summary>The plant the document belongs to, and its name there; null for a document on its own.</summary>
    private PlantContext? InPlant(DocumentSnapshot s, CancellationToken ct) =>
        _plants.Of(s, ct) is { } view && view.FileOfUri(s.Uri) is { } file ? new PlantContext(view, file.Name) : null;

    private bool ReanalyseIfOpen(string uri)
    {
        if (_store.Get(uri) is not { } s) return false;
        _diagnostics.Schedule(s);
        return true;
    }

    /// <summary>Runs a read off the reader thread on the current snapshot; ContentModified if the document moved on meanwhile.</summary>
    private Task<T?> Read<T>(string uri, CancellationToken ct, Func<DocumentSnapshot, T?> read) => Run(() =>
    {
        var snapshot = _store.Get(uri) ?? throw new LocalRpcException($"{uri} is not open") { ErrorCode = ErrorCodes.RequestFailed };
        ct.ThrowIfCancellationRequested();
        var result = read(snapshot);
        ct.ThrowIfCancellationRequested();
        if (_store.Get(uri)?.Version != snapshot.Version)
            throw new LocalRpcException("the document changed while this request was answered") { ErrorCode = ErrorCodes.ContentModified };
        return result;
    }, ct);

    private async Task<T> Run<T>(Func<T> work, CancellationToken ct)
    {
        try
        {
            return await Task.Run(work, ct);
        }
        catch (Exception e) when (e is not (OperationCanceledException or LocalRpcException))
        {
            _log.Error($"request failed: {e}");
            throw new LocalRpcException($"internal error: {e.Message}") { ErrorCode = ErrorCodes.RequestFailed };
        }
    }

    /// <summary>Notifications get no response, and StreamJsonRpc swallows their exceptions, so they log their own.</summary>
    private void Notify(Action action)
    {
        try
        {
            action();
        }
        catch (Exception e)
        {
            _log.Error($"notification failed: {e}");
        }
    }

    private void WatchClient(int pid)
    {
        _ = Task.Run(async () =>
        {
            while (!_exit.Task.IsCompleted)
            {
                if (!IsRunning(pid))
                {
                    _log.Info($"client process {pid} has exited; stopping");
                    _exit.TrySetResult(1);
                    return;
                }

                await Task.Delay(TimeSpan.FromSeconds(1));
            }
        });
    }

    private static bool IsRunning(int pid)
    {
        try
        {
            using var p = Process.GetProcessById(pid);
            return !p.HasExited;
        }
        catch (ArgumentException)
        {
            return false;
        }
    }

    private static WorkspaceEdit Edit(string uri, IEnumerable<Protocol.TextEdit> edits) => new(new() { [uri] = edits.ToArray() });

    private static Protocol.TextEdit WholeDocument(DocumentSnapshot s, string text)
    {
        var last = s.Parse.Tree.Lines[^1];
        return new Protocol.TextEdit(new LspRange(new Position(0, 0), new Position(last.Index, last.Length)), text.TrimStart('\uFEFF'));
    }

    private static bool Overlaps(SourceRange a, SourceRange b) => a.Start.CompareTo(b.End) <= 0 && b.Start.CompareTo(a.End) <= 0;

    private static DocumentSymbol ToSymbol(OutlineNode n) =>
        new(n.Name, n.Detail, SymbolKinds.Of(n.Kind), Convert.ToLsp(n.Range), Convert.ToLsp(n.SelectionRange), n.Children.Select(ToSymbol).ToArray());
}
