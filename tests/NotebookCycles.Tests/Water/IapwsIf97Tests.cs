using NotebookCycles.Properties;
using NotebookCycles.Water;
using Xunit;

namespace NotebookCycles.Tests.Water;

/// <summary>Validation, the saturation policy, phases and regions of <see cref="IapwsIf97"/>.</summary>
public sealed class IapwsIf97Tests
{
    private static readonly IapwsIf97 Steam = IapwsIf97.Default;

    // Range texts: 273.15 K, 2273.15 K, 100 MPa, 50 MPa are the validity limits of IAPWS R7-97(2012) Sec. 2; 647.096 K and
    // 22.064 MPa its critical point (eqs. 2, 3); 0.611213 kPa is psat(273.15 K) by eq. 30; 453.036 K is Tsat(1 MPa)
    // (R7-97(2012) Table 36: 453.035632 K); the metastable-vapour limit of 10 MPa is that of eq. 18 (Sec. 6.2).
    public static TheoryData<string, Func<IapwsIf97, StatePoint>, StateProperty, string> BadInputs() => new()
    {
        { "T is NaN", m => m.FromTP(double.NaN, 1e5), StateProperty.Temperature, "positive finite" },
        { "p is NaN", m => m.FromTP(300, double.NaN), StateProperty.Pressure, "positive finite" },
        { "T below 273.15 K", m => m.FromTP(272.0, 1e5), StateProperty.Temperature, "273.15 K to 2273.15 K" },
        { "T above 2273.15 K", m => m.FromTP(2300.0, 1e5), StateProperty.Temperature, "273.15 K to 2273.15 K" },
        { "p zero", m => m.FromTP(300, 0.0), StateProperty.Pressure, "positive finite" },
        { "p above 100 MPa", m => m.FromTP(300, 101e6), StateProperty.Pressure, "0 kPa to 100 MPa" },
        { "p above 50 MPa in region 5", m => m.FromTP(1500, 60e6), StateProperty.Pressure, "0 kPa to 50 MPa" },
        { "x above 1", m => m.FromTX(300, 1.1), StateProperty.Quality, "0 to 1" },
        { "x below 0", m => m.FromTX(300, -0.1), StateProperty.Quality, "0 to 1" },
        { "x NaN", m => m.FromPX(1e6, double.NaN), StateProperty.Quality, "0 to 1" },
        { "T above Tc with a quality", m => m.FromTX(650, 0.5), StateProperty.Temperature, "273.15 K to 647.096 K" },
        { "p above pc with a quality", m => m.FromPX(30e6, 0.5), StateProperty.Pressure, "22.064 MPa" },
        { "p below the triple line with a quality", m => m.FromPX(500, 0.5), StateProperty.Pressure, "0.611213 kPa to 22.064 MPa" },
        { "h above the maximum at p", m => m.FromPH(1e6, 1e7), StateProperty.Enthalpy, "kJ/kg to" },
        { "h below the minimum at p", m => m.FromPH(1e6, -1e5), StateProperty.Enthalpy, "kJ/kg to" },
        { "h above region 2 at p > 50 MPa", m => m.FromPH(80e6, 5e6), StateProperty.Enthalpy, "kJ/kg to" },
        { "h NaN", m => m.FromPH(1e6, double.NaN), StateProperty.Enthalpy, "any finite number" },
        { "p NaN with h", m => m.FromPH(double.NaN, 1e6), StateProperty.Pressure, "positive finite" },
        { "s above the maximum at p", m => m.FromPS(1e6, 20e3), StateProperty.Entropy, "kJ/(kg·K) to" },
        { "s below the minimum at p", m => m.FromPS(1e6, -1e3), StateProperty.Entropy, "kJ/(kg·K) to" },
        { "s unreachable at T", m => m.FromTS(300, 20e3), StateProperty.Entropy, "kJ/(kg·K) to" },
        { "v below the minimum at T", m => m.FromTV(300, 1e-4), StateProperty.SpecificVolume, "m³/kg to" },
        { "v below the minimum at p", m => m.FromPV(1e6, 1e-5), StateProperty.SpecificVolume, "m³/kg to" },
        { "v negative", m => m.FromPV(1e6, -1.0), StateProperty.SpecificVolume, "positive finite" },
        { "(h, s) unreachable", m => m.FromHS(1e5, 9e3), StateProperty.Entropy, "kJ/(kg·K) to" },
        { "(v, u) with an impossible v", m => m.FromVU(1e-5, 1e5), StateProperty.SpecificVolume, "m³/kg to" },
        { "(v, s) with s out of reach", m => m.FromVS(1.0, 50e3), StateProperty.Entropy, "kJ/(kg·K) to" },
        { "metastable vapour beyond the 5 % moisture line", m => m.MetastableVapourFromTP(400, 1e6), StateProperty.Temperature, "K to 453.036 K" },
        { "metastable vapour above Tsat", m => m.MetastableVapourFromTP(460, 1e6), StateProperty.Temperature, "K to 453.036 K" },
        { "metastable vapour above 10 MPa", m => m.MetastableVapourFromTP(560, 20e6), StateProperty.Pressure, "0.611213 kPa to 10 MPa" },
    };

    [Theory]
    [MemberData(nameof(BadInputs))]
    public void Bad_input_is_rejected_naming_the_property_and_the_range(string what, Func<IapwsIf97, StatePoint> call, StateProperty property, string rangeText)
    {
        var e = Assert.Throws<StateOutOfRangeException>(() => call(Steam));
        Assert.True(e.Property == property, $"{what}: property {e.Property}, expected {property}; message: {e.Message}");
        Assert.Contains("valid " + property.Symbol() + " is " + e.Range, e.Message, StringComparison.Ordinal);
        Assert.Contains(rangeText, e.Message, StringComparison.Ordinal);
        Assert.Contains("(inputs: ", e.Message, StringComparison.Ordinal);
        Assert.Equal(Steam.Name, e.Model);
    }

    [Fact]
    public void Saturation_functions_reject_out_of_range_inputs()
    {
        var a = Assert.Throws<StateOutOfRangeException>(() => Steam.SaturationPressure(700));
        Assert.Contains("valid T is 273.15 K to 647.096 K", a.Message, StringComparison.Ordinal);
        var b = Assert.Throws<StateOutOfRangeException>(() => Steam.SaturationTemperature(30e6));
        Assert.Contains("valid p is 0.611213 kPa to 22.064 MPa", b.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentOutOfRangeException>(() => new IapwsIf97((SaturationPolicy)7));
    }

    [Theory]
    [InlineData(300.0)]
    [InlineData(373.15)]
    [InlineData(600.0)]
    [InlineData(640.0)]
    public void T_p_on_the_saturation_line_throws_by_default(double t)
    {
        double ps = Steam.SaturationPressure(t);
        var e = Assert.Throws<AmbiguousStateException>(() => Steam.FromTP(t, ps));
        Assert.Contains("saturation line", e.Message, StringComparison.Ordinal);
        Assert.Contains("T = ", e.Message, StringComparison.Ordinal);
        Assert.Equal(4, Steam.Region(t, ps));

        // Within the documented tolerance, still on the line; outside it, an ordinary single-phase state.
        Assert.Throws<AmbiguousStateException>(() => Steam.FromTP(t, ps * (1 + 0.5 * IapwsIf97.SaturationTolerance)));
        Assert.Equal(Phase.Liquid, Steam.FromTP(t, ps * (1 + 1e-6)).Phase);
        Assert.Equal(Phase.Vapour, Steam.FromTP(t, ps * (1 - 1e-6)).Phase);
    }

    [Theory]
    [InlineData(SaturationPolicy.SaturatedLiquid, 0.0)]
    [InlineData(SaturationPolicy.SaturatedVapour, 1.0)]
    public void Saturation_policy_chooses_the_saturated_phase(SaturationPolicy policy, double x)
    {
        var model = new IapwsIf97(policy);
        Assert.Equal(policy, model.SaturationPolicy);
        foreach (double t in new[] { 300.0, 500.0, 630.0 })
        {
            var st = model.FromTP(t, model.SaturationPressure(t));
            var expected = model.FromTX(t, x);
            Assert.Equal(expected, st);
            Assert.Equal(x, st.X);
            Assert.Equal(Phase.TwoPhase, st.Phase);
        }
    }

    [Fact]
    public void Phases_and_regions_follow_the_release()
    {
        Assert.Equal(1, Steam.Region(300, 1e6));
        Assert.Equal(2, Steam.Region(500, 1e6));
        Assert.Equal(3, Steam.Region(650, 25e6));
        Assert.Equal(2, Steam.Region(900, 25e6));
        Assert.Equal(5, Steam.Region(1500, 1e6));
        Assert.Equal(Phase.Liquid, Steam.FromTP(300, 1e6).Phase);
        Assert.Equal(Phase.Vapour, Steam.FromTP(500, 1e6).Phase);
        Assert.Equal(Phase.Supercritical, Steam.FromTP(650, 25e6).Phase);
        Assert.Equal(Phase.Supercritical, Steam.FromTP(900, 25e6).Phase);
        Assert.Equal(Phase.Liquid, Steam.FromTP(640, 25e6).Phase);
        Assert.Equal(Phase.Vapour, Steam.FromTP(640, 19e6).Phase);
        Assert.True(double.IsNaN(Steam.FromTP(300, 1e6).X));
    }

    [Fact]
    public void Saturation_functions_are_inverse_and_match_the_critical_point()
    {
        for (double t = 273.15; t <= 647.0; t += 7.3)
        {
            Assert.Equal(t, Steam.SaturationTemperature(Steam.SaturationPressure(t)), 1e-9 * t);
        }

        // Critical parameters: IAPWS R7-97(2012) eqs. 2 to 4.
        Assert.Equal(647.096, Steam.CriticalPoint.T);
        Assert.Equal(22.064e6, Steam.CriticalPoint.P);
        Assert.Equal(1.0 / 322.0, Steam.CriticalPoint.V);
        Assert.Equal(22.064e6, Steam.SaturationPressure(647.096), 1e-6 * 22.064e6);
    }

    [Fact]
    public void Region_3_saturated_densities_satisfy_phase_equilibrium()
    {
        // Eq. 30 and the region-3 equation are consistent: equal Gibbs energies at the saturated densities to about 1e-5 RT
        // (IAPWS R7-97(2012) states the saturation line of region 3 is computed from eq. 28 with psat from eq. 30).
        foreach (double t in new[] { 624.0, 635.0, 645.0, 647.0 })
        {
            var l = Steam.FromTX(t, 0);
            var v = Steam.FromTX(t, 1);
            double gl = l.H - t * l.S, gv = v.H - t * v.S;
            // R = 461.526 J/(kg·K): IAPWS R7-97(2012) eq. 1.
            Assert.True(Math.Abs(gl - gv) / (461.526 * t) < 1e-5, $"T = {t} K: Δg/RT = {(gl - gv) / (461.526 * t):E2}");
            Assert.True(l.V < 1.0 / 322.0 && v.V > 1.0 / 322.0);
        }
    }

    [Theory]
    [InlineData(647.0)]
    [InlineData(647.09)]
    [InlineData(647.0959)]
    [InlineData(647.09599)]
    [InlineData(647.096)]
    public void Saturated_states_exist_up_to_the_critical_temperature(double t)
    {
        var l = Steam.FromTX(t, 0);
        var v = Steam.FromTX(t, 1);
        Assert.True(l.V <= v.V, $"v' = {l.V}, v'' = {v.V}");
        if (t <= 647.0959)
        {
            // Liquid denser than critical, vapour lighter (ρc = 322 kg/m³, R7-97(2012) eq. 4). Closer to Tc than about
            // 0.01 K both phases take the single root of the isotherm (see the model docs).
            Assert.True(l.V < 1.0 / 322.0 && v.V > 1.0 / 322.0, $"v' = {l.V}, v'' = {v.V}");
        }
        Assert.Equal(Steam.SaturationPressure(t), l.P, 1e-9 * l.P); // at Tc itself p = pc, which eq. 30 meets to about 1e-10
    }

    [Fact]
    public void Metastable_vapour_is_only_given_on_request()
    {
        // T = 450 K, p = 1 MPa lies below Tsat(1 MPa) = 453.04 K (R7-97(2012) Table 36): FromTP gives the stable liquid, the separate method the metastable vapour.
        Assert.Equal(Phase.Liquid, Steam.FromTP(450, 1e6).Phase);
        var meta = Steam.MetastableVapourFromTP(450, 1e6);
        Assert.Equal(Phase.Vapour, meta.Phase);
        Assert.NotEqual(Steam.FromTP(450, 1e6).H, meta.H);
    }
}
