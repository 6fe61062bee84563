namespace MotorLang.Cli.Tests; public class SmokeTests { [Fact] public void Ok() => Assert.True(true); }
