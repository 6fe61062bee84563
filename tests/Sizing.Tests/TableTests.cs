using MotorLang.Domain;
using MotorLang.Sizing.Tables;

namespace MotorLang.Sizing.Tests;

/// <summary>
/// Every code table, row by row, against the published table typed out here independently of the
/// CSV data. Values were checked against public reproductions of the 2017 and 2023 editions as
/// recorded in shared/reference/nec-tables.md (section named beside each test).
/// </summary>
public class TableTests
{
    private static void AssertTable(CsvTable table, string published)
    {
        var rows = published.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)
            .Select(r => r.Split(' ', StringSplitOptions.RemoveEmptyEntries)).ToList();
        Assert.Equal(rows.Count, table.Rows.Count);
        for (var i = 0; i < rows.Count; i++)
        {
            Assert.Equal(rows[i].Length, table.Rows[i].Length);
            for (var j = 0; j < rows[i].Length; j++)
            {
                var expected = rows[i][j];
                var actual = table.Rows[i][j];
                if (expected == "-" || actual == "-" || Numbers.Parse(expected) is null) Assert.Equal(expected, actual);
                else Assert.True(Numbers.Parse(expected) == Numbers.Parse(actual), $"{table.Name} row {i + 1} column {table.Columns[j]}: expected {expected}, got {actual}");
            }
        }
    }

    [Fact]
    public void EveryTableNamesItsSourceAndLoads()
    {
        foreach (var t in CodeTables.All)
        {
            Assert.Matches("NFPA 70-2023|NEC|NEMA ICS 2", t.Source);
            Assert.Contains("nec-tables.md", t.Source);
        }
    }

    // NFPA 70-2023 Table 430.250, induction columns 115/200/208/230/460/575/2300 V (nec-tables.md §1)
    [Fact]
    public void Table430_250_ThreePhaseInduction() => AssertTable(CodeTables.ThreePhaseFlc, """
        1/2 4.4 2.5 2.4 2.2 1.1 0.9 -
        3/4 6.4 3.7 3.5 3.2 1.6 1.3 -
        1 8.4 4.8 4.6 4.2 2.1 1.7 -
        1-1/2 12.0 6.9 6.6 6.0 3.0 2.4 -
        2 13.6 7.8 7.5 6.8 3.4 2.7 -
        3 - 11.0 10.6 9.6 4.8 3.9 -
        5 - 17.5 16.7 15.2 7.6 6.1 -
        7-1/2 - 25.3 24.2 22 11 9 -
        10 - 32.2 30.8 28 14 11 -
        15 - 48.3 46.2 42 21 17 -
        20 - 62.1 59.4 54 27 22 -
        25 - 78.2 74.8 68 34 27 -
        30 - 92 88 80 40 32 -
        40 - 120 114 104 52 41 -
        50 - 150 143 130 65 52 -
        60 - 177 169 154 77 62 16
        75 - 221 211 192 96 77 20
        100 - 285 273 248 124 99 26
        125 - 359 343 312 156 125 31
        150 - 414 396 360 180 144 37
        200 - 552 528 480 240 192 49
        250 - - - - 302 242 60
        300 - - - - 361 289 72
        350 - - - - 414 336 83
        400 - - - - 477 382 95
        450 - - - - 515 412 103
        500 - - - - 590 472 118
        """);

    // NFPA 70-2023 Table 430.250, synchronous unity power factor columns (nec-tables.md §1)
    [Fact]
    public void Table430_250_Synchronous() => AssertTable(CodeTables.SynchronousFlc, """
        25 53 26 21 -
        30 63 32 26 -
        40 83 41 33 -
        50 104 52 42 -
        60 123 61 49 12
        75 155 78 62 15
        100 202 101 81 20
        125 253 126 101 25
        150 302 151 121 30
        200 400 201 161 40
        """);

    // NFPA 70-2023 Table 430.248 (nec-tables.md §2)
    [Fact]
    public void Table430_248_SinglePhase() => AssertTable(CodeTables.SinglePhaseFlc, """
        1/6 4.4 2.5 2.4 2.2
        1/4 5.8 3.3 3.2 2.9
        1/3 7.2 4.1 4.0 3.6
        1/2 9.8 5.6 5.4 4.9
        3/4 13.8 7.9 7.6 6.9
        1 16 9.2 8.8 8.0
        1-1/2 20 11.5 11.0 10
        2 24 13.8 13.2 12
        3 34 19.6 18.7 17
        5 56 32.2 30.8 28
        7-1/2 80 46 44 40
        10 100 57.5 55 50
        """);

    // NFPA 70-2023 Table 430.247 (nec-tables.md §3)
    [Fact]
    public void Table430_247_Dc() => AssertTable(CodeTables.DcFlc, """
        1/4 4.0 3.1 2.0 1.6 - -
        1/3 5.2 4.1 2.6 2.0 - -
        1/2 6.8 5.4 3.4 2.7 - -
        3/4 9.6 7.6 4.8 3.8 - -
        1 12.2 9.5 6.1 4.7 - -
        1-1/2 - 13.2 8.3 6.6 - -
        2 - 17 10.8 8.5 - -
        3 - 25 16 12.2 - -
        5 - 40 27 20 - -
        7-1/2 - 58 - 29 13.6 12.2
        10 - 76 - 38 18 16
        15 - - - 55 27 24
        20 - - - 72 34 31
        25 - - - 89 43 38
        30 - - - 106 51 46
        40 - - - 140 67 61
        50 - - - 173 83 75
        60 - - - 206 99 90
        75 - - - 255 123 111
        100 - - - 341 164 148
        125 - - - 425 205 185
        150 - - - 506 246 222
        200 - - - 675 330 294
        """);

    // NFPA 70-2023 Table 430.251(A) (nec-tables.md §4; 10 hp/115 V is 1000 in the 2017 and 2023 texts seen, 600 in 2008 - unresolved)
    [Fact]
    public void Table430_251A_SinglePhaseLockedRotor() => AssertTable(CodeTables.SinglePhaseLockedRotor, """
        1/2 58.8 32.5 29.4
        3/4 82.8 45.8 41.4
        1 96 53 48
        1-1/2 120 66 60
        2 144 80 72
        3 204 113 102
        5 336 186 168
        7-1/2 480 265 240
        10 1000 332 300
        """);

    // NFPA 70-2023 Table 430.251(B) (nec-tables.md §5)
    [Fact]
    public void Table430_251B_PolyphaseLockedRotor() => AssertTable(CodeTables.PolyphaseLockedRotor, """
        1/2 40 23 22.1 20 10 8
        3/4 50 28.8 27.6 25 12.5 10
        1 60 34.5 33 30 15 12
        1-1/2 80 46 44 40 20 16
        2 100 57.5 55 50 25 20
        3 - 73.6 71 64 32 25.6
        5 - 105.8 102 92 46 36.8
        7-1/2 - 146 140 127 63.5 50.8
        10 - 186.3 179 162 81 64.8
        15 - 267 257 232 116 93
        20 - 334 321 290 145 116
        25 - 420 404 365 183 146
        30 - 500 481 435 218 174
        40 - 667 641 580 290 232
        50 - 834 802 725 363 290
        60 - 1001 962 870 435 348
        75 - 1248 1200 1085 543 434
        100 - 1668 1603 1450 725 580
        125 - 2087 2007 1815 908 726
        150 - 2496 2400 2170 1085 868
        200 - 3335 3207 2900 1450 1160
        250 - - - - 1825 1460
        300 - - - - 2200 1760
        350 - - - - 2550 2040
        400 - - - - 2900 2320
        450 - - - - 3250 2600
        500 - - - - 3625 2900
        """);

    // NFPA 70-2023 Table 430.7(B) (nec-tables.md §12)
    [Fact]
    public void Table430_7B_CodeLetters() => AssertTable(CodeTables.CodeLetters, """
        A 0 3.14
        B 3.15 3.54
        C 3.55 3.99
        D 4.0 4.49
        E 4.5 4.99
        F 5.0 5.59
        G 5.6 6.29
        H 6.3 7.09
        J 7.1 7.99
        K 8.0 8.99
        L 9.0 9.99
        M 10.0 11.19
        N 11.2 12.49
        P 12.5 13.99
        R 14.0 15.99
        S 16.0 17.99
        T 18.0 19.99
        U 20.0 22.39
        V 22.4 -
        """);

    // NFPA 70-2023 Table 310.16, Cu 60/75/90 then Al 60/75/90 (nec-tables.md §9)
    [Fact]
    public void Table310_16_Ampacity() => AssertTable(CodeTables.Ampacity, """
        18 - - 14 - - -
        16 - - 18 - - -
        14 15 20 25 - - -
        12 20 25 30 15 20 25
        10 30 35 40 25 30 35
        8 40 50 55 35 40 45
        6 55 65 75 40 50 55
        4 70 85 95 55 65 75
        3 85 100 115 65 75 85
        2 95 115 130 75 90 100
        1 110 130 145 85 100 115
        1/0 125 150 170 100 120 135
        2/0 145 175 195 115 135 150
        3/0 165 200 225 130 155 175
        4/0 195 230 260 150 180 205
        250 215 255 290 170 205 230
        300 240 285 320 195 230 260
        350 260 310 350 210 250 280
        400 280 335 380 225 270 305
        500 320 380 430 260 310 350
        600 350 420 475 285 340 385
        700 385 460 520 315 375 425
        750 400 475 535 320 385 435
        800 410 490 555 330 395 445
        900 435 520 585 355 425 480
        1000 455 545 615 375 445 500
        1250 495 590 665 405 485 545
        1500 525 625 705 435 520 585
        1750 545 650 735 455 545 615
        2000 555 665 750 470 560 630
        """);

    // NFPA 70-2023 Table 310.15(B)(1)(1) (nec-tables.md §10a)
    [Fact]
    public void Table310_15B1_AmbientCorrection() => AssertTable(CodeTables.AmbientCorrection, """
        -50 10 1.29 1.20 1.15
        11 15 1.22 1.15 1.12
        16 20 1.15 1.11 1.08
        21 25 1.08 1.05 1.04
        26 30 1.00 1.00 1.00
        31 35 0.91 0.94 0.96
        36 40 0.82 0.88 0.91
        41 45 0.71 0.82 0.87
        46 50 0.58 0.75 0.82
        51 55 0.41 0.67 0.76
        56 60 - 0.58 0.71
        61 65 - 0.47 0.65
        66 70 - 0.33 0.58
        71 75 - - 0.50
        76 80 - - 0.41
        81 85 - - 0.29
        """);

    // NFPA 70-2023 Table 310.15(C)(1) (nec-tables.md §10b)
    [Fact]
    public void Table310_15C1_Adjustment() => AssertTable(CodeTables.CccAdjustment, """
        1 3 100
        4 6 80
        7 9 70
        10 20 50
        21 30 45
        31 40 40
        41 100000 35
        """);

    // NFPA 70-2023 Table 430.52(C)(1) (nec-tables.md §6a)
    [Fact]
    public void Table430_52C1_Percentages() => AssertTable(CodeTables.ProtectionPercent, """
        single-phase 300 175 800 250
        squirrel-cage 300 175 800 250
        design-b-premium 300 175 1100 250
        synchronous 300 175 800 250
        wound-rotor 150 150 800 150
        dc 150 150 250 150
        """);

    // NFPA 70-2023 240.6(A) and Table 240.6(A) (nec-tables.md §8)
    [Fact]
    public void Section240_6A_StandardRatings()
    {
        var published = new decimal[] { 10, 15, 20, 25, 30, 35, 40, 45, 50, 60, 70, 80, 90, 100, 110, 125, 150, 175, 200,
            225, 250, 300, 350, 400, 450, 500, 600, 700, 800, 1000, 1200, 1600, 2000, 2500, 3000, 4000, 5000, 6000 };
        Assert.Equal(published, Rules.StandardRatings.For(fuse: false));
        Assert.Equal(published.Concat([1m, 3m, 6m, 601m]).Order(), Rules.StandardRatings.For(fuse: true));
    }

    // NFPA 70-2023 Table 250.122 (nec-tables.md §11; aluminum 5000/6000 A = 1250 kcmil in 2023)
    [Fact]
    public void Table250_122_GroundingConductors() => AssertTable(CodeTables.GroundingConductors, """
        15 14 12
        20 12 10
        60 10 8
        100 8 6
        200 6 4
        300 4 2
        400 3 1
        500 2 1/0
        600 1 2/0
        800 1/0 3/0
        1000 2/0 4/0
        1200 3/0 250
        1600 4/0 350
        2000 250 400
        2500 350 600
        3000 400 600
        4000 500 750
        5000 700 1250
        6000 800 1250
        """);

    // NFPA 70-2023 Table 430.22(E) (nec-tables.md §15)
    [Fact]
    public void Table430_22E_DutyCycle() => AssertTable(CodeTables.DutyCycle, """
        short-time 110 120 150 -
        intermittent 85 85 90 140
        periodic 85 90 95 140
        varying 110 120 150 200
        """);

    // NEC 2017 Chapter 9 Table 4, EMT / RMC / PVC schedule 40 total area (nec-tables.md §13a)
    [Fact]
    public void Chapter9Table4_ConduitArea() => AssertTable(CodeTables.ConduitArea, """
        1/2 0.304 0.314 0.285
        3/4 0.533 0.549 0.508
        1 0.864 0.887 0.832
        1-1/4 1.496 1.526 1.453
        1-1/2 2.036 2.071 1.986
        2 3.356 3.408 3.291
        2-1/2 5.858 4.866 4.695
        3 8.846 7.499 7.268
        3-1/2 11.545 10.010 9.737
        4 14.753 12.882 12.554
        """);

    // NEC 2017 Chapter 9 Table 5, THHN/THWN/THWN-2 (nec-tables.md §13b)
    [Fact]
    public void Chapter9Table5_ConductorArea() => AssertTable(CodeTables.ConductorArea, """
        14 0.0097
        12 0.0133
        10 0.0211
        8 0.0366
        6 0.0507
        4 0.0824
        3 0.0973
        2 0.1158
        1 0.1562
        1/0 0.1855
        2/0 0.2223
        3/0 0.2679
        4/0 0.3237
        250 0.3970
        300 0.4608
        350 0.5242
        400 0.5863
        500 0.7073
        600 0.8676
        700 0.9887
        750 1.0496
        800 1.1085
        900 1.2311
        1000 1.3478
        """);

    // NEC 2017 Chapter 9 Table 9 (nec-tables.md §13d): XL pvc/al, XL steel, R cu pvc/al/steel, R al pvc/al/steel
    [Fact]
    public void Chapter9Table9_Impedance() => AssertTable(CodeTables.Impedance, """
        14 0.058 0.073 3.1 3.1 3.1 - - -
        12 0.054 0.068 2.0 2.0 2.0 3.2 3.2 3.2
        10 0.050 0.063 1.2 1.2 1.2 2.0 2.0 2.0
        8 0.052 0.065 0.78 0.78 0.78 1.3 1.3 1.3
        6 0.051 0.064 0.49 0.49 0.49 0.81 0.81 0.81
        4 0.048 0.060 0.31 0.31 0.31 0.51 0.51 0.51
        3 0.047 0.059 0.25 0.25 0.25 0.40 0.41 0.40
        2 0.045 0.057 0.19 0.20 0.20 0.32 0.32 0.32
        1 0.046 0.057 0.15 0.16 0.16 0.25 0.26 0.25
        1/0 0.044 0.055 0.12 0.13 0.12 0.20 0.21 0.20
        2/0 0.043 0.054 0.10 0.10 0.10 0.16 0.16 0.16
        3/0 0.042 0.052 0.077 0.082 0.079 0.13 0.13 0.13
        4/0 0.041 0.051 0.062 0.067 0.063 0.10 0.11 0.10
        250 0.041 0.052 0.052 0.057 0.054 0.085 0.090 0.086
        300 0.041 0.051 0.044 0.049 0.045 0.071 0.076 0.072
        350 0.040 0.050 0.038 0.043 0.039 0.061 0.066 0.063
        400 0.040 0.049 0.033 0.038 0.035 0.054 0.059 0.055
        500 0.039 0.048 0.027 0.032 0.029 0.043 0.048 0.045
        600 0.039 0.048 0.023 0.028 0.025 0.036 0.041 0.038
        750 0.038 0.048 0.019 0.024 0.021 0.029 0.034 0.031
        1000 0.037 0.046 0.015 0.019 0.018 0.023 0.027 0.025
        """);

    // NEC Chapter 9 Table 8: dc resistance at 75 C (nec-tables.md §13c); areas in circular mils from memory
    [Fact]
    public void Chapter9Table8_Resistance() => AssertTable(CodeTables.DcResistance, """
        18 1620 7.95 13.1
        16 2580 4.99 8.21
        14 4110 3.14 5.17
        12 6530 1.98 3.25
        10 10380 1.24 2.04
        8 16510 0.778 1.28
        6 26240 0.491 0.808
        4 41740 0.308 0.508
        3 52620 0.245 0.403
        2 66360 0.194 0.319
        1 83690 0.154 0.253
        1/0 105600 0.122 0.201
        2/0 133100 0.0967 0.159
        3/0 167800 0.0766 0.126
        4/0 211600 0.0608 0.100
        250 250000 0.0515 0.0847
        300 300000 0.0429 0.0707
        350 350000 0.0367 0.0605
        400 400000 0.0321 0.0529
        500 500000 0.0258 0.0424
        600 600000 0.0214 0.0353
        700 700000 0.0184 0.0303
        750 750000 0.0171 0.0282
        800 800000 0.0161 0.0265
        900 900000 0.0143 0.0235
        1000 1000000 0.0129 0.0212
        1250 1250000 0.0103 0.0169
        1500 1500000 0.00858 0.0141
        1750 1750000 0.00735 0.0121
        2000 2000000 0.00643 0.0106
        """);

    // NEMA ICS 2 starter sizes as collected in nec-tables.md §14 (not checked against ICS 2 itself)
    [Fact]
    public void NemaStarterSizes() => AssertTable(CodeTables.NemaStarters, """
        00 9 1.5 1.5 2
        0 18 3 3 5
        1 27 7.5 7.5 10
        2 45 10 15 25
        3 90 25 30 50
        4 135 40 50 100
        5 270 75 100 200
        6 540 150 200 400
        7 810 - 300 600
        """);
}
