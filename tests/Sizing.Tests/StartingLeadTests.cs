using MotorLang.Domain;
using MotorLang.Sizing.Rules;

namespace MotorLang.Sizing.Tests;

/// <summary>
/// Conductors between the controller (or drive) and the motor, drive bypasses and a drive's marked maximum
/// device, NFPA 70-2023 430.22(C), 430.22(D), 430.122(B), 430.122(C), 430.130(A)(2). Hand calculations beside each.
/// </summary>
public class StartingLeadTests
{
    // 430.22(C): 72 % of FLC (the leads carry 58 %, × 125 %). 100 hp 460 V, Table 430.250: 124 A → 89.28 A.
    // 430.22(D): 62.5 % (50 % × 125 %) → 77.5 A. 430.122(B): 125 % of the motor's FLC → 155 A.
    [Fact]
    public void LeadPercentagesOfFullLoadCurrent()
    {
        var wyeDelta = BranchConductors.LeadAmpacity(124m, StartingMethod.WyeDelta)!;
        Assert.Equal(89.28m, wyeDelta.Value);
        Assert.Equal("NEC 430.22(C)", wyeDelta.Steps.Single().Rule);
        var partWinding = BranchConductors.LeadAmpacity(124m, StartingMethod.PartWinding)!;
        Assert.Equal(77.5m, partWinding.Value);
        Assert.Equal("NEC 430.22(D)", partWinding.Steps.Single().Rule);
        var drive = BranchConductors.LeadAmpacity(124m, StartingMethod.Drive)!;
        Assert.Equal(155m, drive.Value);
        Assert.Equal("NEC 430.122(B)", drive.Steps.Single().Rule);
        Assert.Null(BranchConductors.LeadAmpacity(124m, StartingMethod.FullVoltage));
        Assert.Null(BranchConductors.LeadAmpacity(124m, StartingMethod.SoftStart));
    }

    // 430.122(C), the published quiz worked example (Code Quiz, EC&M): a drive with a bypass, rated input 36 A, on a
    // 30 hp 480 V motor (Table 430.250: 40 A). 125 % × 36 = 45 A; 125 % × 40 = 50 A; the larger, 50 A (8 AWG at 75 °C).
    // Trap: without the bypass 430.122(A) gives 45 A, and 10 AWG would look enough at 90 °C.
    [Fact]
    public void BypassTakesTheLargerOfDriveInputAndMotor()
    {
        var bypass = BranchConductors.RequiredAmpacity(new BranchInput(40m, Starting: StartingMethod.Drive, DriveInputAmps: 36m, DriveBypass: true));
        Assert.Equal(50m, bypass.Value);
        Assert.Contains(bypass.Steps, s => s.Rule == "NEC 430.122(C)");
        Assert.Equal(45m, BranchConductors.RequiredAmpacity(new BranchInput(40m, Starting: StartingMethod.Drive, DriveInputAmps: 36m)).Value);
        // Where the drive's input is the larger (62 A input, 58 A motor): 77.5 A either way.
        Assert.Equal(77.5m, BranchConductors.RequiredAmpacity(new BranchInput(58m, Starting: StartingMethod.Drive, DriveInputAmps: 62m, DriveBypass: true)).Value);
    }

    // 430.130(A)(2): a maximum marked on the drive is not exceeded even where 430.52 permits more. 30 hp 460 V, 40 A:
    // inverse-time breaker 250 % = 100 A (Table 430.52(C)(1)); marked 60 A → 60 A. A marking above 100 A permits nothing more.
    [Fact]
    public void DriveMarkedMaximumIsACeilingOnly()
    {
        var code = ShortCircuitProtection.Maximum(new ProtectionInput(40m, ProtectiveDevice.InverseTimeBreaker, Phases.Three));
        Assert.Equal(100m, code.Value);
        var capped = DriveCircuits.MarkedMaximum(code, 60m);
        Assert.Equal(60m, capped.Value);
        Assert.Equal("NEC 430.130(A)(2)", capped.Steps[^1].Rule);
        Assert.Equal(100m, DriveCircuits.MarkedMaximum(code, 150m).Value);
        Assert.Null(DriveCircuits.MarkedMaximum(Result<decimal>.Missing("no value"), 60m).Value);
    }
}
