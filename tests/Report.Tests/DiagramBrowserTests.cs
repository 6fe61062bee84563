using MotorLang.Analysis;
using MotorLang.Report.Diagram;

namespace MotorLang.Report.Tests;

/// <summary>The one-line diagram of 10 feeders × 30 motors drawn by Chromium: the real text boxes, measured.</summary>
[Collection(BrowserCollection.Name)]
public sealed class DiagramBrowserTests(ChromiumFixture chromium)
{
    [Fact]
    public async Task Drawn_labels_stay_inside_their_boxes_and_never_overlap()
    {
        var svg = OneLineDiagram.Svg(Analyzer.Analyze(Plants.Large()), "generated plant");
        var path = Path.Combine(Path.GetTempPath(), $"motorlang-diagram-{Guid.NewGuid():N}.svg");
        await File.WriteAllTextAsync(path, svg);
        try
        {
            await using var page = await chromium.Browser.NewPageAsync();
            var errors = new List<string>();
            page.Console += (_, e) => errors.Add(e.Message.Text);
            await page.GoToAsync(new Uri(path).AbsoluteUri);
            // Text boxes in the drawing's own units (getBBox), and each node's box.
            var boxes = await page.EvaluateExpressionAsync<Label[]>(
                "[...document.querySelectorAll('g.node')].map(g => { const t = g.querySelector('g.label').getBBox(); const r = g.querySelector('rect.box');" +
                " return { id: g.dataset.id, x: t.x, y: t.y, w: t.width, h: t.height," +
                " bx: +r.getAttribute('x'), by: +r.getAttribute('y'), bw: +r.getAttribute('width'), bh: +r.getAttribute('height') }; })");
            Assert.Empty(errors);
            Assert.Equal(312, boxes.Length); // supply, switchboard, 10 MCCs, 300 motors
            foreach (var b in boxes)
                Assert.True(b.X >= b.Bx && b.Y >= b.By && b.X + b.W <= b.Bx + b.Bw && b.Y + b.H <= b.By + b.Bh, $"{b.Id}: its text runs out of its box");
            var sorted = boxes.OrderBy(b => b.X).ToList();
            for (var i = 0; i < sorted.Count; i++)
            {
                for (var j = i + 1; j < sorted.Count && sorted[j].X < sorted[i].X + sorted[i].W; j++)
                    Assert.True(sorted[i].Y + sorted[i].H <= sorted[j].Y || sorted[j].Y + sorted[j].H <= sorted[i].Y, $"labels of {sorted[i].Id} and {sorted[j].Id} overlap");
            }

            await page.SetViewportAsync(new PuppeteerSharp.ViewPortOptions { Width = 1600, Height = 1000 });
            await page.ScreenshotAsync(Path.Combine(Plants.ArtifactFolder(), "one-line-10x30.png"));
        }
        finally
        {
            File.Delete(path);
        }
    }

    public sealed record Label(string Id, double X, double Y, double W, double H, double Bx, double By, double Bw, double Bh);
}
