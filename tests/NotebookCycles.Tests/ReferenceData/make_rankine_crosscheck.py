#!/usr/bin/python3
"""Independent Rankine-cycle figures for the cycle tests, computed with Debian's python3-iapws (IAPWS-IF97).

Only the package's forward equations IAPWS97(P=..., T=...) and its saturation states IAPWS97(P=..., x=...) are
used; isentropic and (p, h) end states are found by bisection on the forward equations, so no backward equation
enters. Run with /usr/bin/python3; writes rankine_crosscheck.csv beside this script.
"""
import csv, datetime, os
from iapws import IAPWS97

def t_from(p, target, prop):
    """Single-phase or two-phase state at pressure p (MPa) with h or s equal to target, by bisection on T / x."""
    sat_l, sat_v = IAPWS97(P=p, x=0), IAPWS97(P=p, x=1)
    lo_v, hi_v = getattr(sat_l, prop), getattr(sat_v, prop)
    if lo_v <= target <= hi_v:
        x = (target - lo_v) / (hi_v - lo_v)
        return IAPWS97(P=p, x=x)
    if target > hi_v:
        lo, hi = sat_v.T + 1e-9, 1073.15
    else:
        lo, hi = 273.15, sat_l.T - 1e-9
    for _ in range(200):
        mid = 0.5 * (lo + hi)
        if getattr(IAPWS97(P=p, T=mid), prop) < target:
            lo = mid
        else:
            hi = mid
    return IAPWS97(P=p, T=0.5 * (lo + hi))

def pump(st, p, eta):
    s2 = t_from(p, st.s, "s")
    return t_from(p, st.h + (s2.h - st.h) / eta, "h")

def turbine(st, p, eta):
    s2 = t_from(p, st.s, "s")
    return t_from(p, st.h - eta * (st.h - s2.h), "h")

rows = []

def simple(name, pb, pc, tit, eta_p, eta_t):
    s1 = IAPWS97(P=pc, x=0)
    s2 = pump(s1, pb, eta_p)
    s3 = IAPWS97(P=pb, T=tit) if tit else IAPWS97(P=pb, x=1)
    s4 = turbine(s3, pc, eta_t)
    w = (s3.h - s4.h) - (s2.h - s1.h)
    q = s3.h - s2.h
    rows.append((name, w / q, w, s4.x if 0 < s4.x < 1 else float("nan")))

def reheat_open_fwh(name, pb, pc, tit, prh, trh, pfwh, eta_p, eta_t):
    # 1 pump 2, open heater 3 (sat. liquid at pfwh), pump 4, boiler 5, HP turbine to prh 6, reheat 7,
    # IP turbine to pfwh 8 (bleed y), LP turbine to pc 9, condenser.
    s1 = IAPWS97(P=pc, x=0)
    s2 = pump(s1, pfwh, eta_p)
    s3 = IAPWS97(P=pfwh, x=0)
    s4 = pump(s3, pb, eta_p)
    s5 = IAPWS97(P=pb, T=tit)
    s6 = turbine(s5, prh, eta_t)
    s7 = IAPWS97(P=prh, T=trh)
    s8 = turbine(s7, pfwh, eta_t)
    s9 = turbine(s8, pc, eta_t)
    y = (s3.h - s2.h) / (s8.h - s2.h)
    w_t = (s5.h - s6.h) + (s7.h - s8.h) + (1 - y) * (s8.h - s9.h)
    w_p = (1 - y) * (s2.h - s1.h) + (s4.h - s3.h)
    q = (s5.h - s4.h) + (s7.h - s6.h)
    rows.append((name, (w_t - w_p) / q, w_t - w_p, y))

simple("ideal saturated 8 MPa / 10 kPa", 8.0, 0.01, None, 1.0, 1.0)
simple("superheat 10 MPa 823.15 K / 8 kPa, eta_p 0.85, eta_t 0.87", 10.0, 0.008, 823.15, 0.85, 0.87)
reheat_open_fwh("reheat 15 MPa 873.15 K, 3 MPa 873.15 K, open FWH 0.5 MPa, 10 kPa, eta 0.9", 15.0, 0.01, 873.15, 3.0, 873.15, 0.5, 0.9, 0.9)

here = os.path.dirname(os.path.abspath(__file__))
with open(os.path.join(here, "rankine_crosscheck.csv"), "w", newline="") as f:
    f.write("# Rankine cycles computed with Debian python3-iapws 1.5.3 (IAPWS-IF97 forward equations and saturation states; "
            "end states by bisection, no backward equations) by make_rankine_crosscheck.py on " + datetime.date.today().isoformat() + ".\n")
    f.write("# Units: w kJ/kg of boiler flow; third figure: turbine exhaust quality (simple cycles) or bleed fraction y (regenerative).\n")
    w = csv.writer(f, lineterminator="\n")
    w.writerow(["case", "efficiency", "net_work_kJ_per_kg", "exhaust_quality_or_bleed"])
    for r in rows:
        w.writerow([r[0], repr(r[1]), repr(r[2]), repr(r[3])])
