using MotorLang.Domain;

namespace MotorLang.Domain.Tests;

public class ConductorSizeTests
{
    // NFPA 70-2023 Chapter 9 Table 8: the size column, smallest to largest.
    private static readonly string[] Table8Sizes =
    [
        "18", "16", "14", "12", "10", "8", "6", "4", "3", "2", "1", "1/0", "2/0", "3/0", "4/0",
        "250", "300", "350", "400", "500", "600", "700", "750", "800", "900", "1000", "1250", "1500", "1750", "2000",
    ];

    [Fact]
    public void The_series_runs_in_the_order_of_chapter_9_table_8()
    {
        Assert.Equal(Table8Sizes, ConductorSize.All.Select(s => s.Number));
        for (var i = 1; i < ConductorSize.All.Count; i++)
            Assert.True(ConductorSize.All[i - 1] < ConductorSize.All[i]);
    }

    [Theory]
    // NFPA 70-2023 Chapter 9 Table 8: sizes through 4/0 are AWG, larger ones kcmil.
    [InlineData("4/0", "AWG")]
    [InlineData("250", "kcmil")]
    [InlineData("14", "AWG")]
    public void Unit_follows_the_table(string number, string unit) => Assert.Equal(unit, ConductorSize.Parse(number).Unit);

    [Fact]
    public void Next_larger_of_4_0_is_250_kcmil_and_the_largest_has_none()
    {
        Assert.Equal(ConductorSize.Parse("250"), ConductorSize.Parse("4/0").NextLarger);
        Assert.Null(ConductorSize.Largest.NextLarger);
    }

    [Fact]
    public void Awg_and_kcmil_lookups_do_not_cross()
    {
        Assert.False(ConductorSize.TryFromKcmil("4/0", out _));
        Assert.False(ConductorSize.TryFromAwg("250", out _));
        Assert.True(ConductorSize.TryFromAwg("1/0", out var s) && s.Number == "1/0");
        Assert.Throws<ArgumentException>(() => ConductorSize.Parse("5"));
    }

    [Fact]
    public void Parallel_sets_print_with_their_count()
    {
        Assert.Equal("2x 500 kcmil", new WireSpec(2, ConductorSize.Parse("500")).ToString());
        Assert.Equal("12 AWG", WireSpec.Single(ConductorSize.Parse("12")).ToString());
    }
}
