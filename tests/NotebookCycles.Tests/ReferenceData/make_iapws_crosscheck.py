#!/usr/bin/python3
"""Writes iapws_if97_crosscheck.csv: IAPWS-IF97 states computed with Debian's python3-iapws, an independent
implementation, for the cross-check test of NotebookCycles.Water.IapwsIf97.

Run with the system interpreter after `apt-get install -y python3-iapws`:
    /usr/bin/python3 tests/NotebookCycles.Tests/ReferenceData/make_iapws_crosscheck.py
The grid is deterministic; points closer than 2 % in pressure to the saturation line or the B23 boundary are left
out, so both implementations choose the same region.
"""
import datetime
import math
import os
import subprocess

import iapws
from iapws import IAPWS97
from iapws.iapws97 import _PSat_T, _P23_T, _TSat_P, _Region3, _Backward3_sat_v_P

HERE = os.path.dirname(os.path.abspath(__file__))
OUT = os.path.join(HERE, "iapws_if97_crosscheck.csv")


def deb_version():
    try:
        return subprocess.run(["dpkg-query", "-W", "-f=${Version}", "python3-iapws"],
                              capture_output=True, text=True, check=True).stdout.strip()
    except Exception:  # not a Debian system
        return "unknown"


def geom(a, b, n):
    return [a * (b / a) ** (k / (n - 1)) if k < n - 1 else b for k in range(n)]


def lin(a, b, n):
    return [a + (b - a) * k / (n - 1) if k < n - 1 else b for k in range(n)]


def tp_points():
    pts = []
    for T in lin(273.16, 620.0, 8):                      # region 1
        ps = _PSat_T(T)
        for P in geom(ps * 1.05, 100.0, 8):
            pts.append((T, P))
    for T in lin(280.0, 1073.0, 12):                     # region 2
        pmax = _PSat_T(T) * 0.95 if T <= 623.15 else (_P23_T(T) * 0.97 if T <= 863.15 else 100.0)
        for P in geom(1e-3, pmax, 7):
            pts.append((T, P))
    for T in lin(630.0, 850.0, 9):                       # region 3
        for P in lin(_P23_T(T) * 1.03, 100.0, 7):
            if T < 647.096 and abs(P / _PSat_T(T) - 1) < 0.02:
                continue
            pts.append((T, P))
    for T in lin(1100.0, 2273.0, 7):                     # region 5
        for P in geom(1e-3, 50.0, 6):
            pts.append((T, P))
    return pts


class Saturated:
    """A saturated state above 623.15 K. The package takes these densities from the SR5-05 backward equations without
    iteration; here they are polished by Newton on the package's own region-3 equation p(rho, T) = psat."""

    def __init__(self, T, P, x):
        phases = []
        for side in (0, 1):
            rho = 1.0 / _Backward3_sat_v_P(P, T, side)
            for _ in range(60):
                d = rho * 1e-7
                f = _Region3(rho, T)["P"] - P
                slope = (_Region3(rho + d, T)["P"] - _Region3(rho - d, T)["P"]) / (2 * d)
                step = f / slope
                rho -= step
                if abs(step) < 1e-13 * rho:
                    break
            props = _Region3(rho, T)
            props["u"] = props["h"] - props["P"] * 1000.0 * props["v"]
            phases.append(props)
        liq, vap = phases
        assert 1.0 / liq["v"] > 322.0 > 1.0 / vap["v"], (T, P)
        self.T, self.P, self.region = T, P, 4
        for key in ("v", "h", "u", "s"):
            setattr(self, key, liq[key] + x * (vap[key] - liq[key]))


def saturated(T=None, P=None, x=0.0):
    if T is None:
        T = _TSat_P(P)
    if P is None:
        P = _PSat_T(T)
    if T <= 623.15:
        return IAPWS97(T=T, x=x) if P is None else IAPWS97(P=P, x=x)
    return Saturated(T, P, x)


def row(kind, st, x="", T=None, P=None):
    def f(v):
        return "" if v is None else repr(float(v))

    two_phase = kind != "TP"
    cp, cv, w = (None, None, None) if two_phase else (st.cp, st.cv, st.w)
    return ",".join([kind, f(st.T if T is None else T), f(st.P if P is None else P), x if x == "" else repr(float(x)), str(st.region), f(st.v), f(st.h), f(st.u),
                     f(st.s), f(cp), f(cv), f(w)])


def main():
    lines = []
    for T, P in tp_points():
        lines.append(row("TP", IAPWS97(T=T, P=P), T=T, P=P))
    for T in lin(273.16, 646.0, 20):
        for x in (0.0, 0.4, 1.0):
            lines.append(row("TX", IAPWS97(T=T, x=x) if T <= 623.15 else saturated(T=T, x=x), x))
    for P in geom(0.001, 22.0, 14):
        for x in (0.0, 0.7, 1.0):
            lines.append(row("PX", IAPWS97(P=P, x=x) if _TSat_P(P) <= 623.15 else saturated(P=P, x=x), x))
    today = datetime.date.today().isoformat()
    with open(OUT, "w", encoding="utf-8") as fh:
        fh.write(f"# IAPWS-IF97 states computed with Debian package python3-iapws {deb_version()} (its module reports version {iapws.__version__}), an independent implementation, on {today}.\n")
        fh.write("# Generator: make_iapws_crosscheck.py in this folder (deterministic grid over regions 1, 2, 3, 5 and the saturation dome).\n")
        fh.write("# kind: TP = from (T, p); TX = saturated from (T, x); PX = saturated from (p, x). Units: T K, p MPa, v m3/kg, h and u kJ/kg, s, cp, cv kJ/(kg K), w m/s; cp, cv, w empty for two-phase states.\n")
        fh.write("# Saturated states above 623.15 K: the package takes their densities from the SR5-05 backward equations without iteration (up to 1.6 % off near 22 MPa); this script polishes them by Newton on the package's own region-3 equation p(rho, T) = psat(T) and mixes the phases by quality.\n")
        fh.write("kind,T,p,x,region,v,h,u,s,cp,cv,w\n")
        fh.write("\n".join(lines) + "\n")
    print(f"{len(lines)} states written to {OUT}")


if __name__ == "__main__":
    main()
