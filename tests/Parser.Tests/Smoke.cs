namespace MotorLang.Parser.Tests; public class SmokeTests { [Fact] public void Ok() => Assert.True(true); }
