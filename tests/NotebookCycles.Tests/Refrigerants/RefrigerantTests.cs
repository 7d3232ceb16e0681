using NotebookCycles.Properties;
using NotebookCycles.Refrigerants;
using Xunit;

namespace NotebookCycles.Tests.Refrigerants;

/// <summary>The refrigerant models: front door, reference states, saturation consistency, round trips, bad input.</summary>
public sealed class RefrigerantTests
{
    public static TheoryData<string> Fluids() => [.. Refrigerant.Names];

    [Fact]
    public void Front_door_lists_the_fluids()
    {
        Assert.Equal(["R134a", "R32", "R1234yf", "R744", "R717", "R717-1993", "R290"], Refrigerant.Names);
        Assert.Contains("Gao", Refrigerant.R717.Citation, StringComparison.Ordinal);
        Assert.Contains("Tillner-Roth", Refrigerant.R717TillnerRoth.Citation, StringComparison.Ordinal);
        Assert.Equal("R-744", Refrigerant.Get("CO2").Fluid);
        Assert.Same(Refrigerant.R134a, Refrigerant.Get("R-134a"));
        Assert.Same(Refrigerant.R32.WithReference(ReferenceState.Ashrae), Refrigerant.Get("R32", ReferenceState.Ashrae));
    }

    [Theory]
    [MemberData(nameof(Fluids))]
    public void Reference_states_follow_their_definitions(string fluid)
    {
        // Definitions: IIR h = 200 kJ/kg, s = 1 kJ/(kg·K) for saturated liquid at 0 °C; ASHRAE h = s = 0 at −40 °C;
        // NBP h = s = 0 at 101.325 kPa (common practice, the reference-state definitions named in the coefficient files).
        var iir = Refrigerant.Get(fluid).FromTX(273.15, 0);
        Assert.Equal(200_000, iir.H, 0.05);
        Assert.Equal(1000, iir.S, 1e-3);
        var ashrae = Refrigerant.Get(fluid, ReferenceState.Ashrae).FromTX(233.15, 0);
        Assert.Equal(0, ashrae.H, 0.05);
        Assert.Equal(0, ashrae.S, 1e-3);
        if (fluid != "R744")
        {
            var nbp = Refrigerant.Get(fluid, ReferenceState.NormalBoilingPoint).FromPX(101_325, 0);
            Assert.Equal(0, nbp.H, 0.05);
            Assert.Equal(0, nbp.S, 1e-3);
        }
        else
        {
            Assert.Throws<ArgumentException>(() => Refrigerant.Get(fluid, ReferenceState.NormalBoilingPoint));
        }
    }

    [Theory]
    [MemberData(nameof(Fluids))]
    public void Saturation_is_phase_equilibrium_from_triple_to_critical_point(string fluid)
    {
        var m = Refrigerant.Get(fluid);
        double tt = m.TripleTemperature, tc = m.CriticalPoint.T;
        foreach (double frac in new[] { 0.0, 0.1, 0.3, 0.5, 0.7, 0.9, 0.99, 0.999, 0.9999 })
        {
            double t = tt + frac * (tc - tt);
            var sat = m.Saturation(t);
            double gl = sat.Liquid.H - t * sat.Liquid.S, gv = sat.Vapour.H - t * sat.Vapour.S;
            Assert.True(Math.Abs(gl - gv) < 1e-8 * Math.Abs(sat.Vapour.H) + 1e-6, $"{fluid} {t} K: g′ − g″ = {gl - gv}");
            Assert.Equal(sat.Vapour.P, sat.Liquid.P, 1e-8 * sat.P + 1e-9);
            Assert.True(sat.Liquid.Rho > sat.Vapour.Rho);
            // Back from the pressure.
            Assert.Equal(t, m.SaturationTemperature(sat.P), 1e-8 * t);
        }
    }

    [Theory]
    [InlineData(250.0)]
    [InlineData(300.0)]
    [InlineData(350.0)]
    public void R1234yf_saturation_satisfies_clausius_clapeyron(double t)
    {
        // No published saturation table rows for R-1234yf are in the verification file: internal consistency instead
        // (equal p and g of the phases is checked above); here dp/dT = Δh/(T·Δv) against the computed enthalpy of vaporisation.
        var m = Refrigerant.R1234yf;
        const double h = 1e-3;
        double dpdt = (m.SaturationPressure(t - 2 * h) - 8 * m.SaturationPressure(t - h) + 8 * m.SaturationPressure(t + h) - m.SaturationPressure(t + 2 * h)) / (12 * h);
        var sat = m.Saturation(t);
        double cc = sat.EnthalpyOfVaporisation / (t * (sat.Vapour.V - sat.Liquid.V));
        Assert.Equal(cc, dpdt, 1e-7 * cc);
    }

    [Theory]
    [MemberData(nameof(Fluids))]
    public void Pairs_round_trip(string fluid)
    {
        var m = Refrigerant.Get(fluid);
        double tc = m.CriticalPoint.T;
        var states = new List<StatePoint>
        {
            m.FromTX(0.8 * tc, 0.35),
            m.FromTP(0.75 * tc, m.SaturationPressure(0.75 * tc) * 1.5),
            m.FromTP(0.9 * tc, m.SaturationPressure(0.8 * tc)),
            m.FromTP(Math.Min(1.2 * tc, 0.5 * (tc + m.TemperatureRange.Maximum)), 2 * m.CriticalPoint.P),
        };
        foreach (var s in states)
        {
            void Same(StatePoint b, string pair)
            {
                Assert.True(Math.Abs(b.T - s.T) < 1e-7 * s.T, $"{fluid} {pair}: T {b.T} vs {s.T}");
                Assert.True(Math.Abs(b.H - s.H) < 1e-7 * Math.Abs(s.H) + 1e-3, $"{fluid} {pair}: h {b.H} vs {s.H}");
                Assert.True(Math.Abs(b.V - s.V) < 1e-7 * s.V, $"{fluid} {pair}: v {b.V} vs {s.V}");
            }

            Same(m.FromPH(s.P, s.H), "p,h");
            Same(m.FromPS(s.P, s.S), "p,s");
            Same(m.FromPV(s.P, s.V), "p,v");
            Same(m.FromTS(s.T, s.S), "T,s");
            Same(m.FromTV(s.T, s.V), "T,v");
            Same(m.FromVU(s.V, s.U), "v,u");
            Same(m.FromVS(s.V, s.S), "v,s");
            if (s.IsTwoPhase)
            {
                Same(m.FromTH(s.T, s.H), "T,h");
                Assert.Equal(s.X, m.FromPH(s.P, s.H).X, 1e-9);
            }
        }
    }

    [Fact]
    public void Saturation_policy_picks_a_phase_on_the_line()
    {
        var m = Refrigerant.R134a;
        double p = m.SaturationPressure(280);
        Assert.Throws<AmbiguousStateException>(() => m.FromTP(280, p));
        Assert.Equal(0, m.WithSaturationPolicy(SaturationPolicy.SaturatedLiquid).FromTP(280, p).X);
        Assert.Equal(1, m.WithSaturationPolicy(SaturationPolicy.SaturatedVapour).FromTP(280, p).X);
        Assert.Equal(m.FromTX(280, 1).V, m.FromTP(280, p, Phase.Vapour).V, 1e-12);
    }

    public static TheoryData<string, StateProperty, string> BadInputs() => new()
    {
        { "T below the triple point", StateProperty.Temperature, "169.85 K" },
        { "T above the range", StateProperty.Temperature, "455 K" },
        { "p above the range", StateProperty.Pressure, "70 MPa" },
        { "p negative", StateProperty.Pressure, "to 70 MPa" },
        { "T NaN", StateProperty.Temperature, "169.85 K" },
        { "x above 1", StateProperty.Quality, "0 to 1" },
        { "x below 0", StateProperty.Quality, "0 to 1" },
        { "T,x above Tc", StateProperty.Temperature, "374.21" },
        { "p,x above pc", StateProperty.Pressure, "4059.28 kPa" },
        { "p,x below the triple-point pressure", StateProperty.Pressure, "4059.28 kPa" },
        { "saturation below the triple point", StateProperty.Temperature, "169.85 K" },
        { "saturation temperature above pc", StateProperty.Pressure, "4059.28 kPa" },
        { "liquid asked below p_sat", StateProperty.Pressure, "to 70 MPa" },
        { "vapour asked above p_sat", StateProperty.Pressure, "kPa" },
        { "h NaN", StateProperty.Enthalpy, "any finite number" },
        { "h below the liquid at p", StateProperty.Enthalpy, "kJ/kg" },
        { "s above the vapour at p", StateProperty.Entropy, "kJ/(kg·K)" },
        { "v negative", StateProperty.SpecificVolume, "positive" },
        { "T,rho implying p above the range", StateProperty.Pressure, "70 MPa" },
        { "v,u with negative v", StateProperty.SpecificVolume, "positive" },
        { "T,s below the triple point", StateProperty.Temperature, "169.85 K" },
        { "p,h above the range", StateProperty.Pressure, "70 MPa" },
    };

    [Theory]
    [MemberData(nameof(BadInputs))]
    public void Bad_input_names_the_property_and_its_range(string what, StateProperty property, string rangeText)
    {
        var m = Refrigerant.R134a;
        Func<StatePoint> call = what switch
        {
            "T below the triple point" => () => m.FromTP(150, 1e5),
            "T above the range" => () => m.FromTP(500, 1e5),
            "p above the range" => () => m.FromTP(300, 8e7),
            "p negative" => () => m.FromTP(300, -5),
            "T NaN" => () => m.FromTP(double.NaN, 1e5),
            "x above 1" => () => m.FromTX(260, 1.2),
            "x below 0" => () => m.FromTX(260, -0.1),
            "T,x above Tc" => () => m.FromTX(380, 0.5),
            "p,x above pc" => () => m.FromPX(5e6, 0.5),
            "p,x below the triple-point pressure" => () => m.FromPX(100, 0.5),
            "saturation below the triple point" => () => m.Saturation(160).Liquid,
            "saturation temperature above pc" => () => m.FromTP(m.SaturationTemperature(4.2e6), 1e5),
            "liquid asked below p_sat" => () => m.FromTP(280, 1e5, Phase.Liquid),
            "vapour asked above p_sat" => () => m.FromTP(280, 1e6, Phase.Vapour),
            "h NaN" => () => m.FromPH(1e5, double.NaN),
            "h below the liquid at p" => () => m.FromPH(1e5, -1e6),
            "s above the vapour at p" => () => m.FromPS(1e5, 1e5),
            "v negative" => () => m.FromTV(300, -0.1),
            "T,rho implying p above the range" => () => m.FromTRho(200, 1650),
            "v,u with negative v" => () => m.FromVU(-1, 2e5),
            "T,s below the triple point" => () => m.FromTS(100, 1000),
            "p,h above the range" => () => m.FromPH(1e8, 3e5),
            _ => throw new InvalidOperationException(what),
        };
        var ex = Assert.Throws<StateOutOfRangeException>(() => call());
        Assert.Equal(property, ex.Property);
        Assert.Contains(property.Symbol(), ex.Message, StringComparison.Ordinal);
        Assert.Contains(rangeText, ex.Message, StringComparison.Ordinal);
        Assert.Contains(m.Name, ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Unknown_names_and_unavailable_reference_states_are_refused()
    {
        var ex = Assert.Throws<ArgumentException>(() => Refrigerant.Get("R999"));
        Assert.Contains("R134a", ex.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentException>(() => Refrigerant.R744.WithReference(ReferenceState.NormalBoilingPoint));
        Assert.Throws<AmbiguousStateException>(() => Refrigerant.R290.FromTP(250, Refrigerant.R290.SaturationPressure(250)));
    }
}
