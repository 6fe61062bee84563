using MotorLang.Server.Protocol;

namespace MotorLang.Server.Tests;

/// <summary>The editor honours `# acknowledge CODE: reason` exactly as `check` does: the finding goes, a stale directive is reported.</summary>
public class AcknowledgementDiagnosticsTests
{
    // 10 hp, 13 A nameplate, SF 1.15: 17 A is above 125 % x 13 A = 16.25 A (430.32(A)(1)) and
    // within 140 % = 18.2 A (430.32(C)), so M205.
    private const string Motor =
        "feeder F 480V 3ph\n  wire 8 AWG\n  ground 10 AWG\n  protection inverse-time-breaker 35A\n" +
        "  motor M 10hp\n    nameplate 13A\n    service-factor 1.15\n    design B\n    wire 12 AWG\n    ground 12 AWG\n" +
        "    protection inverse-time-breaker 35A\n";

    [Fact]
    public async Task ADirectiveTypedIntoACommentTakesEffectAndGoesStaleWhenTheValueChanges()
    {
        await using var server = await InProcessServer.StartAsync();
        var client = server.Client;
        const string uri = "file:///ack.motors";
        await client.Open(uri, Motor + "    overload 17A  # note\n");
        Assert.Equal(["M205"], (await client.DiagnosticsAsync(uri, 1, TimeSpan.FromSeconds(10))).Diagnostics.Select(d => d.Code));

        await client.Change(uri, 2, new TextDocumentContentChangeEvent(null, Motor + "    overload 17A  # acknowledge M205: does not start on 16.25 A\n"));
        Assert.Empty((await client.DiagnosticsAsync(uri, 2, TimeSpan.FromSeconds(10))).Diagnostics);

        await client.Change(uri, 3, new TextDocumentContentChangeEvent(null, Motor + "    overload 16A  # acknowledge M205: does not start on 16.25 A\n"));
        Assert.Equal(["M320"], (await client.DiagnosticsAsync(uri, 3, TimeSpan.FromSeconds(10))).Diagnostics.Select(d => d.Code));
    }
}
