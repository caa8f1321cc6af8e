#!/usr/bin/python3
"""Write test/fixtures/iapws-water.json: liquid water reference values from iapws.

Reference library: iapws (Debian package python3-iapws), a general-purpose open-source
implementation of the IAPWS releases. Run from the repository root with Debian's Python:

    /usr/bin/python3 scripts/make-iapws-fixture.py

The vitest tests in test/physics/water only read the JSON (CI has no Python). Each value
records which iapws function produced it; the "generator" block records the library version
and how it was called.

Columns per temperature point (SI units: K, Pa, kg/m^3, Pa*s):
  T          temperature
  p          pressure used for the liquid properties: max(101325 Pa, psat(T))
  psat       iapws97._PSat_T(T)            IAPWS-IF97 region 4, Eq. 30
  rho        1 / iapws97._Region1(T, p)["v"]  IAPWS-IF97 region 1
  mu         _iapws._Viscosity(rho, T)     IAPWS 2008, no critical enhancement
  rho95      IAPWS95(T=T, P=p).rho         IAPWS-95 scientific formulation
             (IAPWS95(T=T, x=0) where p = psat: saturated liquid)
  mu95       the same IAPWS95 object's .mu  IAPWS 2008 with the critical enhancement mu2
  mu95NoEnhancement  _iapws._Viscosity(rho95, T)  same density, mu2 = 1
"""

import json
import os
import platform
import subprocess
import sys

import iapws
from iapws import IAPWS95
from iapws._iapws import _Viscosity
from iapws.iapws97 import _PSat_T, _Region1, _TSat_P

ATM = 101325.0
MPA = 1e6

# 0.01 °C (the triple point) and every 5 °C from 5 to 200 °C, plus 3.98 °C (near the
# density maximum) and 99.97 °C (near the normal boiling point): 43 points.
CELSIUS = sorted([0.01, 3.98, 99.97] + [5.0 * k for k in range(1, 41)])

# Pressures for the backward saturation-temperature equation, Pa.
SATURATION_PRESSURES = [
    700.0, 1000.0, 2000.0, 5000.0, 1e4, 2e4, 5e4, 101325.0, 2e5, 5e5, 1e6, 1.5e6,
]


def debian_package_version():
    try:
        out = subprocess.run(
            ["dpkg-query", "-W", "-f=${Version}", "python3-iapws"],
            capture_output=True,
            text=True,
            check=True,
        )
        return out.stdout.strip() or None
    except (OSError, subprocess.CalledProcessError):
        return None


def point(celsius):
    T = round(celsius + 273.15, 6)
    psat = _PSat_T(T) * MPA
    p = max(ATM, psat)
    rho = 1.0 / _Region1(T, p / MPA)["v"]
    mu = _Viscosity(rho, T)
    # At p = psat the (T, p) solve may land on the vapour root, so on the saturation line take
    # IAPWS-95's own saturated liquid (its psat differs from IF97's by far less than the
    # density is sensitive to).
    water95 = IAPWS95(T=T, x=0) if psat >= ATM else IAPWS95(T=T, P=p / MPA)
    if not water95.rho > 500.0:
        sys.exit(f"IAPWS95 did not return the liquid root at T={T} K, p={p} Pa")
    return {
        "T": T,
        "p": p,
        "psat": psat,
        "rho": rho,
        "mu": mu,
        "rho95": water95.rho,
        "mu95": water95.mu,
        "mu95NoEnhancement": _Viscosity(water95.rho, T),
    }


# The state points of the verification tables in the IAPWS releases; the tests compare the
# tables' printed values with these library values, so that neither rests on one source.
TABLE_POINTS = {
    # IAPWS R7-97(2012) Table 35: T in K.
    "if97Table35Psat": [300.0, 500.0, 600.0],
    # IAPWS R7-97(2012) Table 36: p in MPa.
    "if97Table36Tsat": [0.1, 1.0, 10.0],
    # IAPWS R7-97(2012) Table 5: (T in K, p in MPa).
    "if97Table5Region1": [(300.0, 3.0), (300.0, 80.0), (500.0, 3.0)],
    # IAPWS R12-08 Table 4: (T in K, rho in kg/m^3).
    "viscosityTable4": [
        (298.15, 998.0),
        (298.15, 1200.0),
        (373.15, 1000.0),
        (433.15, 1.0),
        (433.15, 1000.0),
        (873.15, 1.0),
        (873.15, 100.0),
        (873.15, 600.0),
        (1173.15, 1.0),
        (1173.15, 100.0),
        (1173.15, 400.0),
    ],
}


def table_points():
    def region1(T, p_mpa):
        r = _Region1(T, p_mpa)
        # iapws returns kJ-based units; convert to SI (J/kg, J/(kg K)).
        return {
            "T": T,
            "p": p_mpa * MPA,
            "v": r["v"],
            "h": r["h"] * 1e3,
            "u": (r["h"] - p_mpa * 1e3 * r["v"]) * 1e3,
            "s": r["s"] * 1e3,
            "cp": r["cp"] * 1e3,
            "w": r["w"],
        }

    return {
        "if97Table35Psat": [
            {"T": T, "psat": _PSat_T(T) * MPA} for T in TABLE_POINTS["if97Table35Psat"]
        ],
        "if97Table36Tsat": [
            {"p": p * MPA, "T": _TSat_P(p)} for p in TABLE_POINTS["if97Table36Tsat"]
        ],
        "if97Table5Region1": [region1(T, p) for T, p in TABLE_POINTS["if97Table5Region1"]],
        "viscosityTable4": [
            {"T": T, "rho": rho, "mu": _Viscosity(rho, T)}
            for T, rho in TABLE_POINTS["viscosityTable4"]
        ],
    }


def main():
    fixture = {
        "generator": {
            "script": "scripts/make-iapws-fixture.py",
            "command": "/usr/bin/python3 scripts/make-iapws-fixture.py",
            "library": "iapws",
            "libraryVersion": iapws.__version__,
            "debianPackage": "python3-iapws",
            "debianPackageVersion": debian_package_version(),
            "python": platform.python_version(),
            "calls": {
                "psat": "iapws.iapws97._PSat_T(T) * 1e6",
                "rho": "1 / iapws.iapws97._Region1(T, p / 1e6)['v']",
                "mu": "iapws._iapws._Viscosity(rho, T)",
                "rho95": (
                    "iapws.IAPWS95(T=T, P=p / 1e6).rho if psat < 101325"
                    " else iapws.IAPWS95(T=T, x=0).rho"
                ),
                "mu95": "the same IAPWS95 object's .mu (includes the critical enhancement)",
                "mu95NoEnhancement": "iapws._iapws._Viscosity(rho95, T)",
                "saturationTemperature.T": "iapws.iapws97._TSat_P(p / 1e6)",
                "tablePoints.if97Table35Psat": "iapws.iapws97._PSat_T(T) * 1e6",
                "tablePoints.if97Table36Tsat": "iapws.iapws97._TSat_P(p / 1e6)",
                "tablePoints.if97Table5Region1": (
                    "iapws.iapws97._Region1(T, p / 1e6): v, h, s, cp, w; u = h - p v;"
                    " kJ converted to J"
                ),
                "tablePoints.viscosityTable4": "iapws._iapws._Viscosity(rho, T)",
            },
            "pressureRule": "p = max(101325 Pa, psat(T))",
        },
        "units": {"T": "K", "p": "Pa", "psat": "Pa", "rho": "kg/m3", "mu": "Pa s"},
        "points": [point(c) for c in CELSIUS],
        "saturationTemperature": [
            {"p": p, "T": _TSat_P(p / MPA)} for p in SATURATION_PRESSURES
        ],
        "tablePoints": table_points(),
    }
    root = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))
    path = os.path.join(root, "test", "fixtures", "iapws-water.json")
    os.makedirs(os.path.dirname(path), exist_ok=True)
    with open(path, "w", encoding="utf-8") as out:
        json.dump(fixture, out, indent=2)
        out.write("\n")
    print(f"wrote {path}: {len(fixture['points'])} temperature points")


if __name__ == "__main__":
    main()
