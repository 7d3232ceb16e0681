using System.Text.RegularExpressions;
using NotebookCycles.Cycles;
using NotebookCycles.Gases;
using NotebookCycles.Rendering.Tests;
using NotebookCycles.Sweeps;
using NotebookCycles.Units.Literals;
using Xunit;

namespace NotebookCycles.Interactive.Tests;

/// <summary>The interactive sweep chart in a real headless browser, offline, on a page with an AMD loader like RequireJS front ends.</summary>
public sealed class InteractiveBrowserTests
{
    [ChromiumFact]
    public void Plotly_draws_offline_beside_an_AMD_loader_and_hides_the_SVG_fallback()
    {
        string folder = Path.Combine(AppContext.BaseDirectory, "browser-artifacts");
        Directory.CreateDirectory(folder);
        var sweep = Sweep.Over("pressure ratio", ParameterRange.Linear(2, 20, 10), "turbine inlet temperature, K", [1100, 1300, 1500],
            (rp, t) => GasTurbineCycles.Brayton(ColdAirStandard.Air, 300.Kelvins(), 100.Kilopascals(), rp, t.Kelvins()));
        // Outside a kernel the first (and every) display carries plotly.js.
        string fragment = SweepDisplay.Html(sweep);
        string amd = "<script>window.define=function(){window.__amdCalls=(window.__amdCalls||0)+1;};window.define.amd={};window.require=function(){};</script>";
        string probe = "<script>document.body.setAttribute('data-probe',[typeof window.Plotly,typeof window.define,String(window.__amdCalls||0)].join(' '));</script>";
        string page = Path.Combine(folder, "sweep-interactive.html");
        File.WriteAllText(page, "<!doctype html><html><head><meta charset=\"utf-8\"><title>Sweep, interactive</title>" + amd + "</head><body style=\"background:#fff;color:#111\">" + fragment + probe + "</body></html>");

        string dom = Browser.Run(new Uri(page).AbsoluteUri, "--virtual-time-budget=10000", "--dump-dom");
        Assert.Contains("data-probe=\"object function 0\"", dom, StringComparison.Ordinal);
        // Two charts (efficiency and net work): both drawn by plotly, both fallbacks hidden.
        Assert.Equal(2, Regex.Matches(dom, "<div class=\"nbc-fallback\" id=\"[^\"]*\" style=\"display: none;\"").Count);
        Assert.True(Regex.Matches(dom, "class=\"main-svg\"").Count >= 2, "plotly drew no chart");

        string shot = Path.Combine(folder, "sweep-interactive.png");
        File.Delete(shot);
        Browser.Run(new Uri(page).AbsoluteUri, "--virtual-time-budget=10000", "--window-size=1400,1100", "--hide-scrollbars", "--screenshot=" + shot);
        Assert.True(new FileInfo(shot).Length > 30_000, "the screenshot is nearly empty");
    }
}
