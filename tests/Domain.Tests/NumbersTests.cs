using MotorLang.Domain;

namespace MotorLang.Domain.Tests;

public class NumbersTests
{
    [Theory]
    // Horsepower ratings as NFPA 70-2023 Table 430.250 prints them.
    [InlineData("1/2", 0.5)]
    [InlineData("1-1/2", 1.5)]
    [InlineData("7-1/2", 7.5)]
    [InlineData("15", 15)]
    [InlineData("0.75", 0.75)]
    public void Reads_table_numbers(string text, double expected) => Assert.Equal((decimal)expected, Numbers.Parse(text));

    [Theory]
    [InlineData("4/0")] // a wire size, not a number
    [InlineData("x")]
    [InlineData("1-/2")]
    public void Refuses_what_is_not_a_number(string text) => Assert.Null(Numbers.Parse(text));

    [Theory]
    [InlineData(0.5, "1/2")]
    [InlineData(1.5, "1-1/2")]
    [InlineData(7.5, "7-1/2")]
    [InlineData(40, "40")]
    public void Prints_horsepower_as_the_tables_do(double hp, string expected) => Assert.Equal(expected, Numbers.Horsepower((decimal)hp));

    [Fact]
    public void Thirds_and_sixths_print_as_fractions()
    {
        // NFPA 70-2023 Table 430.248 lists 1/6 and 1/3 hp.
        Assert.Equal("1/3", Numbers.Horsepower(1m / 3));
        Assert.Equal("1/6", Numbers.Horsepower(1m / 6));
    }
}
