// Engine benchmark: build and solve the Born–Haber cycle and run the four lattice models for 1,000
// compounds generated from a table of real salts with varied inputs. Prints the time per compound and
// the ratio to a plain-number (float) version of the same arithmetic. Run: npx tsx perf/engine.bench.ts
import os from 'node:os';
import { buildBornHaberCycle, runModelCheck, solveBornHaberCycle, type ExplicitValue } from '../lib/thermo/index';

interface Salt {
  formula: string;
  structure: string;
  rc: number;
  ra: number;
  r0: number;
  density: number;
  n: number;
  values: Record<string, string>;
}

// Inputs as in lib/thermo/outside-checks.test.ts (CRC ΔfH°, ionization energies, electron affinities);
// radii, distances and densities are approximate (3–4 significant figures) — they only feed the timing.
const SALTS: Salt[] = [
  { formula: 'NaCl', structure: 'rock salt', rc: 102, ra: 181, r0: 281, density: 2.165, n: 8, values: { 'enthalpy_of_formation:NaCl': '-411.2', 'enthalpy_of_atomization:Na': '107.5', 'ionization_energy_1:Na': '495.8', 'bond_dissociation_enthalpy:Cl2': '242.6', 'electron_gain_enthalpy_1:Cl': '-348.575' } },
  { formula: 'KCl', structure: 'rock salt', rc: 138, ra: 181, r0: 315, density: 1.984, n: 9, values: { 'enthalpy_of_formation:KCl': '-436.5', 'enthalpy_of_atomization:K': '89.0', 'ionization_energy_1:K': '418.8', 'bond_dissociation_enthalpy:Cl2': '242.6', 'electron_gain_enthalpy_1:Cl': '-348.575' } },
  { formula: 'MgCl2', structure: 'cadmium chloride', rc: 72, ra: 181, r0: 254, density: 2.32, n: 8, values: { 'enthalpy_of_formation:MgCl2': '-641.3', 'enthalpy_of_atomization:Mg': '147.1', 'ionization_energy_1:Mg': '737.7', 'ionization_energy_2:Mg': '1450.7', 'bond_dissociation_enthalpy:Cl2': '242.6', 'electron_gain_enthalpy_1:Cl': '-348.575' } },
  { formula: 'CaCl2', structure: 'calcium chloride', rc: 100, ra: 181, r0: 274, density: 2.15, n: 9, values: { 'enthalpy_of_formation:CaCl2': '-795.4', 'enthalpy_of_atomization:Ca': '177.8', 'ionization_energy_1:Ca': '589.8', 'ionization_energy_2:Ca': '1145.4', 'bond_dissociation_enthalpy:Cl2': '242.6', 'electron_gain_enthalpy_1:Cl': '-348.575' } },
  { formula: 'Li2O', structure: 'antifluorite', rc: 76, ra: 140, r0: 200, density: 2.013, n: 6, values: { 'enthalpy_of_formation:Li2O': '-597.9', 'enthalpy_of_atomization:Li': '159.3', 'ionization_energy_1:Li': '520.2', 'bond_dissociation_enthalpy:O2': '498.4', 'electron_gain_enthalpy_1:O': '-140.976', 'electron_gain_enthalpy_2:O': '844' } },
  { formula: 'MgO', structure: 'rock salt', rc: 72, ra: 140, r0: 210, density: 3.58, n: 7, values: { 'enthalpy_of_formation:MgO': '-601.6', 'enthalpy_of_atomization:Mg': '147.1', 'ionization_energy_1:Mg': '737.7', 'ionization_energy_2:Mg': '1450.7', 'bond_dissociation_enthalpy:O2': '498.4', 'electron_gain_enthalpy_1:O': '-140.976', 'electron_gain_enthalpy_2:O': '844' } },
  { formula: 'CaO', structure: 'rock salt', rc: 100, ra: 140, r0: 240, density: 3.34, n: 8, values: { 'enthalpy_of_formation:CaO': '-634.9', 'enthalpy_of_atomization:Ca': '177.8', 'ionization_energy_1:Ca': '589.8', 'ionization_energy_2:Ca': '1145.4', 'bond_dissociation_enthalpy:O2': '498.4', 'electron_gain_enthalpy_1:O': '-140.976', 'electron_gain_enthalpy_2:O': '844' } },
  { formula: 'Al2O3', structure: 'corundum', rc: 53.5, ra: 140, r0: 191, density: 3.99, n: 7, values: { 'enthalpy_of_formation:Al2O3': '-1675.7', 'enthalpy_of_atomization:Al': '330.0', 'ionization_energy_1:Al': '577.5', 'ionization_energy_2:Al': '1816.7', 'ionization_energy_3:Al': '2744.8', 'bond_dissociation_enthalpy:O2': '498.4', 'electron_gain_enthalpy_1:O': '-140.976', 'electron_gain_enthalpy_2:O': '844' } },
];

const COUNT = 1000;

// Deterministic variation: ±0.5 % on every value so each compound is a distinct problem.
let seed = 12345;
function rand(): number {
  seed = (seed * 1103515245 + 12345) & 0x7fffffff;
  return seed / 0x7fffffff;
}
function vary(x: number): number {
  return x * (1 + (rand() - 0.5) * 0.01);
}

interface Problem {
  salt: Salt;
  values: Record<string, ExplicitValue>;
  numbers: Record<string, number>;
  rc: number;
  ra: number;
  r0: number;
  density: number;
}

const problems: Problem[] = [];
for (let i = 0; i < COUNT; i += 1) {
  const salt = SALTS[i % SALTS.length] as Salt;
  const values: Record<string, ExplicitValue> = {};
  const numbers: Record<string, number> = {};
  for (const [key, text] of Object.entries(salt.values)) {
    const x = Number(vary(Number(text)).toFixed(4));
    values[key] = { value: x.toString(), uncertainty: '0.5' };
    numbers[key] = x;
  }
  problems.push({ salt, values, numbers, rc: vary(salt.rc), ra: vary(salt.ra), r0: vary(salt.r0), density: vary(salt.density) });
}

function runEngine(p: Problem): number {
  const cycle = buildBornHaberCycle({ formula: p.salt.formula, values: p.values });
  const solved = solveBornHaberCycle(cycle);
  const check = runModelCheck({
    formula: p.salt.formula,
    structure: p.salt.structure,
    interionicDistancePm: p.r0,
    cationRadiusPm: p.rc,
    anionRadiusPm: p.ra,
    density: p.density,
    cycleLatticeEnthalpy: solved.latticeEnthalpy.value,
  });
  return check.models.length;
}

// The same arithmetic with plain JS numbers: coefficient-weighted closure, quadrature, four models.
const COULOMB = (6.02214076e23 * 1.602176634e-19 ** 2) / (4 * Math.PI * 8.8541878128e-12);
const COEFF: Record<string, (a: number, b: number) => number> = {
  enthalpy_of_formation: () => -1,
  enthalpy_of_atomization: (a) => a,
  ionization_energy_1: (a) => a,
  ionization_energy_2: (a) => a,
  ionization_energy_3: (a) => a,
  bond_dissociation_enthalpy: (_a, b) => b / 2,
  electron_gain_enthalpy_1: (_a, b) => b,
  electron_gain_enthalpy_2: (_a, b) => b,
};
const COUNTS: Record<string, [number, number, number, number, number]> = {
  // a, b, z+, |z−|, Madelung
  NaCl: [1, 1, 1, 1, 1.74756], KCl: [1, 1, 1, 1, 1.74756], MgCl2: [1, 2, 2, 1, 2.244], CaCl2: [1, 2, 2, 1, 2.365],
  Li2O: [2, 1, 1, 2, 2.51939], MgO: [1, 1, 2, 2, 1.74756], CaO: [1, 1, 2, 2, 1.74756], Al2O3: [2, 3, 3, 2, 4.1719],
};
const MOLAR: Record<string, number> = { NaCl: 58.44, KCl: 74.55, MgCl2: 95.21, CaCl2: 110.98, Li2O: 29.88, MgO: 40.30, CaO: 56.08, Al2O3: 101.96 };
function runFloat(p: Problem): number {
  const [a, b, zc, za, M] = COUNTS[p.salt.formula] ?? [1, 1, 1, 1, 1.74756];
  let sum = 0;
  let u2 = 0;
  for (const [key, x] of Object.entries(p.numbers)) {
    const c = (COEFF[key.split(':')[0] ?? ''] ?? (() => 1))(a, b);
    sum += c * x;
    u2 += (c * 0.5) ** 2;
  }
  const lattice = sum;
  const u = Math.sqrt(u2);
  const RT = (8.314462618 * 298.15) / 1000;
  const corr = -((a + b) / 2) * RT;
  const bl = (COULOMB * M * zc * za) / (p.r0 * 1e-12) * (1 - 1 / p.salt.n) / 1000 + corr;
  const bm = (COULOMB * M * zc * za) / (p.r0 * 1e-12) * (1 - 34.5 / p.r0) / 1000 + corr;
  const rs = (p.rc + p.ra) * 1e-12;
  const kap = (1.2025e-4 * (a + b) * zc * za) / rs * (1 - 3.45e-11 / rs) / 1000 + corr;
  const V = ((MOLAR[p.salt.formula] ?? 1) / (p.density * 6.02214076e23)) * 1e21;
  const I = (a * zc * zc + b * za * za) / 2;
  const vb = 121.39 * I * Math.cbrt((2 * I) / V) + corr;
  return [bl, bm, kap, vb].filter((m) => Math.abs(m - lattice) / lattice < 10 && u >= 0).length;
}

interface Timing {
  wallUs: number;
  cpuUs: number;
}

/** Wall-clock and CPU time per compound (CPU time is less disturbed by other processes on a shared machine). */
function time(fn: (p: Problem) => number): Timing {
  let sink = 0;
  const cpu0 = process.cpuUsage();
  const start = process.hrtime.bigint();
  for (const p of problems) sink += fn(p);
  const ns = Number(process.hrtime.bigint() - start);
  const cpu = process.cpuUsage(cpu0);
  if (sink < 0) console.log(sink);
  return { wallUs: ns / 1000 / problems.length, cpuUs: (cpu.user + cpu.system) / problems.length };
}

// Warm up both paths, then take the best of five runs.
time(runEngine);
time(runFloat);
const engineRuns: Timing[] = [];
const floatRuns: Timing[] = [];
for (let i = 0; i < 5; i += 1) {
  engineRuns.push(time(runEngine));
  floatRuns.push(time(runFloat));
}
const best = (runs: Timing[], key: keyof Timing): number => Math.min(...runs.map((r) => r[key]));
const engineWall = best(engineRuns, 'wallUs');
const engineCpu = best(engineRuns, 'cpuUs');
const floatWall = best(floatRuns, 'wallUs');
const TARGET_US = 100;
const [load1] = os.loadavg();
console.log(`compounds: ${COUNT} (from ${SALTS.length} real salts, inputs varied ±0.5 %); load average ${load1?.toFixed(2)} on ${os.cpus().length} CPUs`);
console.log(`engine (decimal.js cycle + float models): ${engineWall.toFixed(1)} µs per compound wall clock, ${engineCpu.toFixed(1)} µs CPU`);
console.log(`plain-number version of the same arithmetic: ${floatWall.toFixed(2)} µs per compound wall clock`);
console.log(`ratio engine / plain numbers: ${(engineWall / floatWall).toFixed(0)}×`);
console.log(`target: ≤ ${TARGET_US} µs per compound (wall clock) — ${engineWall <= TARGET_US ? 'met' : 'NOT met'}${engineWall > TARGET_US && engineCpu <= TARGET_US ? ' (met on CPU time; the machine is shared)' : ''}`);
