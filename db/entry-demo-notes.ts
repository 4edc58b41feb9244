/**
 * The invented text of the demo logbook (Quillon at the Kestrin Deep Site), read by db/seed/seed-logbook.ts.
 * Days count from the scenario start; the grid repair is on day 15 and the full fiducial volume returns on day 23.
 */
import type { EntryCategory, RunType } from "./schema";

const MARA = "mara.velen@kestrin-deep.example";
const TOBIAS = "tobias.renn@kestrin-deep.example";
const ILSE = "ilse.achter@kestrin-deep.example";
const PRIYA = "priya.castel@kestrin-deep.example";
const OSKAR = "oskar.lunde@kestrin-deep.example";
const JONAH = "jonah.fell@kestrin-deep.example";

/** A second revision: either a whole new text (`body`) or a note added at the end of the first (`append`). */
export type DemoRevision = { afterHours: number; author?: string; title?: string; body?: string; append?: string; tags?: string[] };

export type DemoNote = {
  category: EntryCategory;
  author: string;
  title: string;
  body: string;
  tags: string[];
  needsSafetyReview?: boolean;
  revision?: DemoRevision;
};

export type DemoDayNote = DemoNote & { day: number; hour: number; linkRuns?: { type?: RunType; count: number } };

export type DemoShift = {
  author: string;
  writerName: string;
  answers: (fiducialKg: string) => Record<string, string>;
  openIssues: string[];
  revision?: DemoRevision;
};

/** Handover answers keyed by a phrase of the template line they fill. */
const steady = (o2: string, level: string, pressure: string) => (fiducialKg: string) => ({
  "Quillon TPC": `nominal, fiducial ${fiducialKg} kg in the configuration`,
  "Quillon-Ge": "bias 4.5 kV on all eight crystals, leakage < 10 pA",
  "DAQ:": "trigger rate 4.1 Hz, dead time 1.8 %, buffer 38 % full",
  "Xenon vessel pressure": `${pressure} bar, liquid level ${level} mm`,
  "Cold head": "171.2 K, LN2 reserve 64 %",
  "Oxygen monitors": `all six heads at ${o2} % O2`,
  "Alarms raised": "none",
  "Alarms still active": "none",
  "Sources in use": "none out at handover",
  "Sources returned": "Cs-137 (KDS-CS-02) back in the source safe, logged in",
  "run ": "all ended normally, live time as the DAQ reported",
  "Runs stopped early": "none",
});

export const SHIFT_NOTES: DemoShift[] = [
  { author: MARA, writerName: "Mara Velen", answers: steady("20.9", "412", "1.78"), openIssues: ["PMT 14 gain about 3 % low against last week's LED run — experts informed."] },
  { author: JONAH, writerName: "Jonah Fell", answers: steady("20.9", "411", "1.79"), openIssues: [] },
  {
    author: MARA,
    writerName: "Mara Velen",
    answers: steady("20.8", "412", "1.80"),
    openIssues: ["Recirculation flow dipped to 48 slpm twice around 03:10 UTC; recovered by itself."],
    revision: {
      afterHours: 1,
      append: "**Correction:** the flow dipped twice, at 03:10 and again at 03:40 UTC. Next shift please watch the recirculation flow.\n",
    },
  },
  { author: JONAH, writerName: "Jonah Fell", answers: steady("20.9", "410", "1.78"), openIssues: ["Disk buffer on daq-02 at 71 %; transfer to surface running slowly."] },
  { author: MARA, writerName: "Mara Velen", answers: steady("20.9", "412", "1.77"), openIssues: [] },
  { author: JONAH, writerName: "Jonah Fell", answers: steady("20.9", "409", "1.81"), openIssues: ["Gate grid section 3 trips at 4.9 kV: science data stopped, experts on site (see detector entry)."] },
  { author: MARA, writerName: "Mara Velen", answers: steady("20.9", "411", "1.79"), openIssues: ["Running on the reduced fiducial volume (948.5 kg) until the grid section is confirmed stable."] },
  { author: JONAH, writerName: "Jonah Fell", answers: steady("20.8", "412", "1.78"), openIssues: [] },
  { author: MARA, writerName: "Mara Velen", answers: steady("20.9", "412", "1.78"), openIssues: [] },
  { author: JONAH, writerName: "Jonah Fell", answers: steady("20.9", "413", "1.78"), openIssues: ["Full fiducial volume restored today; first science runs look normal."] },
  { author: MARA, writerName: "Mara Velen", answers: steady("20.9", "412", "1.79"), openIssues: [] },
  { author: JONAH, writerName: "Jonah Fell", answers: steady("20.9", "412", "1.78"), openIssues: [] },
];

export const LOGBOOK_NOTES: DemoDayNote[] = [
  {
    day: 0, hour: 9.5, category: "run_note", author: TOBIAS, tags: ["science-run-a", "start"], linkRuns: { type: "science", count: 2 },
    title: "Science run A starts",
    body: "First hour-long science runs of **Science run A**.\n\n- Drift field 0.23 kV/cm, extraction field 6.1 kV/cm\n- Fiducial target 950 kg liquid xenon\n- Trigger: S2 threshold at 150 PE\n\nDQ shifters: please flag anything odd in the PMT hit maps.",
  },
  {
    day: 1, hour: 14, category: "calibration", author: ILSE, tags: ["kr83m", "energy-scale"], linkRuns: { type: "calibration", count: 1 },
    title: "Kr-83m injection for the energy scale",
    body: "Injected Kr-83m from the rubidium generator at 13:20 UTC.\n\n| line | expected (keV) | fitted (keV) |\n| --- | --- | --- |\n| combined | 41.5 | 41.3 |\n| first transition | 32.1 | 32.0 |\n\nThe rate fell back to the background level after about 12 h (1.83 h half-life).",
  },
  {
    day: 2, hour: 10, category: "detector", author: TOBIAS, tags: ["pmt", "gain"],
    title: "PMT 14 gain low",
    body: "LED calibration shows PMT 14 (top array, ring 2) at **0.97** of its reference gain.\nNo change in dark rate. Will raise the bias by 10 V at the next access.",
    revision: { afterHours: 26, append: "\nUpdate: bias raised by 10 V; gain now 1.00 ± 0.01 of reference.", tags: ["pmt", "gain", "done"] },
  },
  {
    day: 3, hour: 11, category: "daq_computing", author: JONAH, tags: ["daq", "firmware"],
    title: "Digitiser firmware 2.4.1 on all boards",
    body: "Updated the digitiser firmware on crates A and B (2.4.0 → 2.4.1, fixes the rare timestamp wrap).\n\n```\ndaq-ctl firmware --crate A,B --version 2.4.1\nall 16 boards report 2.4.1\n```\n\nNoise run afterwards looks normal.",
  },
  {
    day: 5, hour: 15, category: "calibration", author: ILSE, tags: ["cs137", "source"], linkRuns: { type: "calibration", count: 2 },
    title: "Cs-137 calibration, external source at position 2",
    body: "Source KDS-CS-02 deployed in the calibration tube at position 2 (mid-height) from 14:05 to 15:10 UTC.\nPhotopeak at 662 keV reconstructed at 659 keV; resolution σ/E = 1.9 %.\nSource returned to the safe at 15:25 UTC.",
  },
  {
    day: 7, hour: 3.5, category: "maintenance", author: MARA, tags: ["ln2", "refill"],
    title: "LN2 dewar refill",
    body: "Dewar D-2 refilled from the surface tank transfer: 58 % → 93 %.\nOxygen monitors in the cryo alcove stayed at 20.9 % O2 during the transfer.",
  },
  {
    day: 9, hour: 4, category: "cryogenics", author: JONAH, tags: ["recirculation", "pressure"], needsSafetyReview: true, linkRuns: { type: "science", count: 1 },
    title: "Recirculation pump swap and pressure excursion",
    body: "Swapped recirculation pump P-1 for the spare (P-2) after its bearing noise grew.\n\n- Flow stopped 03:42–03:58 UTC\n- Vessel pressure rose from 1.78 to **1.92 bar** (relief valve set at 2.5 bar)\n- Pressure back to 1.79 bar by 04:30 UTC\n\nTwo people present, oxygen monitors normal throughout, portable O2 meter carried.",
    revision: { afterHours: 5, author: TOBIAS, append: "\nExpert note: the science runs during the stop should get a caution flag on the xenon purity subsystem." },
  },
  {
    day: 10, hour: 13, category: "run_note", author: PRIYA, tags: ["data-quality"], linkRuns: { type: "science", count: 1 },
    title: "Lower electron lifetime after the pump swap",
    body: "Electron lifetime dropped from 820 µs to 640 µs after the pump swap and is recovering (~15 µs per hour).\nThe analysis will apply the lifetime correction from the Kr-83m data; no exclusion needed.",
  },
  {
    day: 12, hour: 10, category: "radiation", author: OSKAR, tags: ["ambe", "leak-test", "survey"], needsSafetyReview: true,
    title: "AmBe source leak test and area survey",
    body: "Yearly wipe test of the AmBe neutron source KDS-AMBE-01: result below the detection limit of the counter.\nDose-rate survey around the source safe: 0.4 µSv/h at 30 cm with the door closed, as before.\nNext test due in twelve months.",
  },
  {
    day: 13, hour: 16, category: "calibration", author: ILSE, tags: ["ambe", "neutron"], linkRuns: { type: "calibration", count: 2 },
    title: "AmBe neutron calibration",
    body: "Neutron calibration with KDS-AMBE-01 at the side port, 15:00–16:40 UTC.\nNuclear-recoil band agrees with the last calibration within the statistical error.\nSource back in the safe at 16:55 UTC, checked in by Oskar Lunde.",
  },
  {
    day: 15, hour: 2.5, category: "detector", author: TOBIAS, tags: ["grid", "hv", "repair"], linkRuns: { type: "science", count: 2 },
    title: "Gate grid section 3 trips — repair and reduced fiducial volume",
    body: "The gate grid tripped four times between 01:00 and 02:20 UTC at 4.9 kV.\nIsolated section 3 and lowered the drift field to 0.19 kV/cm.\n\nThe outer radius cut is tightened near the repaired section: fiducial target **948.5 kg** from today.",
    revision: { afterHours: 30, append: "\nUpdate: no further trips in 24 h at the reduced field. The detector configuration \"Quillon after grid repair\" is in force." },
  },
  {
    day: 16, hour: 9, category: "run_note", author: PRIYA, tags: ["science-run-b"], linkRuns: { type: "science", count: 1 },
    title: "Science run B (post-repair) starts",
    body: "Data from here on belongs to **Science run B (post-repair)** until the full fiducial volume is restored.\nAcceptance and background model follow the 948.5 kg configuration.",
  },
  {
    day: 18, hour: 20, category: "daq_computing", author: JONAH, tags: ["storage", "transfer"],
    title: "Surface transfer backlog cleared",
    body: "The link to the surface was capped at 200 Mbit/s by a misconfigured switch port. Fixed with the site network team; backlog of 1.4 TB transferred in 9 h.",
  },
  {
    day: 20, hour: 5, category: "incident", author: MARA, tags: ["power", "ups"], linkRuns: { type: "science", count: 2 },
    title: "Short power dip in the cavern",
    body: "Mains dip at 04:51 UTC (about 200 ms). UPS held the slow control and the cryo controls.\nDAQ crate B rebooted; the running run ended early and a new run was started at 05:07 UTC.\nNo alarms from the cryogenic system.",
  },
  {
    day: 21, hour: 11, category: "maintenance", author: TOBIAS, tags: ["ups", "test"],
    title: "UPS battery test after the power dip",
    body: "Load test of UPS-1 and UPS-2: 38 and 41 minutes of autonomy at present load, both above the 30 minute requirement.",
  },
  {
    day: 23, hour: 10, category: "detector", author: TOBIAS, tags: ["grid", "hv", "fiducial"], linkRuns: { type: "science", count: 1 },
    title: "Full fiducial volume restored",
    body: "Grid section 3 has held 4.9 kV for 48 h. Drift field back to 0.23 kV/cm; the fiducial target is **950 kg** again from today.",
  },
  {
    day: 25, hour: 14, category: "calibration", author: ILSE, tags: ["kr83m", "energy-scale"], linkRuns: { type: "calibration", count: 1 },
    title: "Kr-83m check after the restore",
    body: "Energy scale from the combined 41.5 keV line agrees with day 1 within 0.3 %.",
  },
  {
    day: 23, hour: 8.5, category: "run_note", author: MARA, tags: ["noise"], linkRuns: { type: "noise", count: 1 },
    title: "Weekly noise run",
    body: "Noise run taken with the HV on and the trigger forced at 10 Hz. Baselines within ±2 ADC counts on all channels.",
  },
];
