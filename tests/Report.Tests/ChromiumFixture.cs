using PuppeteerSharp;

namespace MotorLang.Report.Tests;

/// <summary>
/// One headless Debian Chromium for all browser tests. The executable is always given, so PuppeteerSharp
/// never fetches a browser; a fresh profile, no background networking, no component updates.
/// </summary>
public sealed class ChromiumFixture : IAsyncLifetime
{
    public const string Executable = "/usr/bin/chromium";

    private readonly string _profile = Path.Combine(Path.GetTempPath(), "motorlang-report-tests-" + Guid.NewGuid().ToString("N"));

    public IBrowser Browser { get; private set; } = null!;

    public async Task InitializeAsync()
    {
        if (!File.Exists(Executable))
            throw new InvalidOperationException($"{Executable} is missing: install Debian's chromium (apt-get install -y chromium); .ci/run does.");
        Browser = await Puppeteer.LaunchAsync(new LaunchOptions
        {
            ExecutablePath = Executable,
            Headless = true,
            UserDataDir = _profile,
            Args =
            [
                "--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync",
                "--no-first-run", "--disable-dev-shm-usage",
            ],
        });
    }

    public async Task DisposeAsync()
    {
        await Browser.CloseAsync();
        try
        {
            Directory.Delete(_profile, recursive: true);
        }
        catch (IOException)
        {
            // Chromium may still be letting go of its profile; a temp folder left behind is harmless.
        }
    }
}

[CollectionDefinition(Name)]
public sealed class BrowserCollection : ICollectionFixture<ChromiumFixture>
{
    public const string Name = "chromium";
}
