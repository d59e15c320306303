import { describe, it, expect } from "vitest";
import { execFileSync } from "node:child_process";
import { loadDataset } from "../../../lib/data/load-dataset";
import { speciesAtTemperature } from "../../../lib/data/species-at-temperature";

/**
 * The apparent Gibbs energy of liquid water from the starter entry (CODATA ΔfG°, S° and the Haas–Fisher
 * fit of its Cp) against IAPWS-95 (Wagner & Pruss 2002, J. Phys. Chem. Ref. Data 31, 387) via Debian's
 * python3-iapws, at 0.1 MPa:
 *   G(T) − G(Tr) = [h(T) − h(Tr)] − T·[s(T) − s(Tr)] − S°(Tr)·(T − Tr),
 * which needs only differences of IAPWS h and s plus the CODATA S°. The Cp fit came from the same
 * IAPWS-95 values, so this checks the fit and its integration chain, not the CODATA numbers.
 */
const temperaturesK = [273.16, 283.15, 298.15, 313.15, 333.15, 353.15, 372.15];

const python = `
import json
from iapws import IAPWS95
M = 18.015268e-3
out = []
for t in ${JSON.stringify(temperaturesK)}:
    w = IAPWS95(T=t, P=0.1)
    out.append([w.h * 1e3 * M, w.s * 1e3 * M])
print(json.dumps(out))
`;

describe("liquid water in the starter data", () => {
  it("follows the IAPWS-95 Gibbs energy at 0.1 MPa within 3 J/mol from 0.01 to 99 °C", () => {
    const iapws = JSON.parse(execFileSync("/usr/bin/python3", ["-c", python], { encoding: "utf8" })) as [number, number][];
    const loaded = loadDataset();
    if (!loaded.ok) throw new Error(loaded.error.message);
    const water = loaded.value.species.find((s) => s.id === "H2O(l)")!;
    const entropyJPerMolK = water.standard!.entropyJPerMolK;
    const gibbsAtReferenceJPerMol = water.standard!.gibbsJPerMol;
    const reference = iapws[temperaturesK.indexOf(298.15)];
    temperaturesK.forEach((temperatureK, index) => {
      const [enthalpyJPerMol, iapwsEntropyJPerMolK] = iapws[index];
      const expectedJPerMol =
        gibbsAtReferenceJPerMol +
        (enthalpyJPerMol - reference[0]) -
        temperatureK * (iapwsEntropyJPerMolK - reference[1]) -
        entropyJPerMolK * (temperatureK - 298.15);
      const dataJPerMol = speciesAtTemperature(loaded.value, temperatureK).find((s) => s.id === "H2O(l)")!.gibbsJPerMol;
      expect(Math.abs(dataJPerMol - expectedJPerMol), `${temperatureK} K`).toBeLessThan(3);
    });
  });
});
