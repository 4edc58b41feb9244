import { describe, it, expect } from "vitest";
import { firstIssue, flagProposalSchema, periodCreateSchema, periodPatchSchema, subsystemSchema } from "@/components/quality/inputs";

// What the issue asks the API to refuse: 400 naming the field and the reason (common practice for JSON APIs).
const flag = { startAt: "2032-01-05T10:00:00Z", endAt: "2032-01-05T11:00:00Z", subsystem: "daq", verdict: "exclude", reason: "DAQ busy" };

describe("flag proposals", () => {
  it("accepts a well-formed proposal and reads the times as UTC instants", () => {
    const parsed = flagProposalSchema.parse(flag);
    expect(parsed.startAt.getTime()).toBe(Date.UTC(2032, 0, 5, 10)); // Date.UTC, ECMAScript reference
    expect(parsed.endAt.getTime() - parsed.startAt.getTime()).toBe(3_600_000); // one hour
  });

  it("an offset is honoured, not dropped (10:00+01:00 is 09:00 UTC, ISO 8601)", () => {
    expect(flagProposalSchema.parse({ ...flag, startAt: "2032-01-05T10:00:00+01:00" }).startAt.getTime()).toBe(Date.UTC(2032, 0, 5, 9));
  });

  it.each([
    { label: "end before start", body: { ...flag, endAt: "2032-01-05T09:00:00Z" }, field: "endAt" },
    { label: "end equal to start (an empty interval)", body: { ...flag, endAt: flag.startAt }, field: "endAt" },
    { label: "a time without zone", body: { ...flag, startAt: "2032-01-05T10:00:00" }, field: "startAt" },
    { label: "an unknown verdict", body: { ...flag, verdict: "maybe" }, field: "verdict" },
    { label: "no reason", body: { ...flag, reason: " " }, field: "reason" },
  ])("refuses $label, naming the field", ({ body, field }) => {
    const r = flagProposalSchema.safeParse(body);
    expect(r.success).toBe(false);
    if (!r.success) expect(firstIssue(r.error).field).toBe(field);
  });
});

const period = { name: "Science run A", startAt: "2032-01-01T00:00:00Z", endAt: "2032-02-01T00:00:00Z", runTypes: ["science"], signalAcceptance: 0.82 };

describe("periods", () => {
  it("defaults to not blind", () => {
    expect(periodCreateSchema.parse(period).blind).toBe(false);
  });

  it.each([
    // acceptance is a probability: 0 ≤ a ≤ 1 (definition)
    { label: "acceptance above 1", body: { ...period, signalAcceptance: 1.2 }, field: "signalAcceptance" },
    { label: "negative acceptance", body: { ...period, signalAcceptance: -0.1 }, field: "signalAcceptance" },
    { label: "acceptance that is not a number", body: { ...period, signalAcceptance: Number.NaN }, field: "signalAcceptance" },
    { label: "no run types", body: { ...period, runTypes: [] }, field: "runTypes" },
    { label: "an unknown run type", body: { ...period, runTypes: ["physics"] }, field: "runTypes.0" },
    { label: "a span turned inside out", body: { ...period, endAt: "2031-12-01T00:00:00Z" }, field: "endAt" },
  ])("refuses $label", ({ body, field }) => {
    const r = periodCreateSchema.safeParse(body);
    expect(r.success).toBe(false);
    if (!r.success) expect(firstIssue(r.error).field).toBe(field);
  });

  it.each([
    { label: "acceptance 0 and 1 are the inclusive ends", body: { signalAcceptance: 1 }, ok: true },
    { label: "a patch may change one field", body: { notes: "after the grid repair" }, ok: true },
    { label: "a patch with both ends checks their order", body: { startAt: "2032-02-01T00:00:00Z", endAt: "2032-01-01T00:00:00Z" }, ok: false },
  ])("patch: $label", ({ body, ok }) => {
    expect(periodPatchSchema.safeParse(body).success).toBe(ok);
  });
});

describe("subsystems", () => {
  it.each([
    { label: "codes are lower-cased", body: { code: "Purification", label: "Purification loop" }, code: "purification" },
    { label: "dashes are allowed", body: { code: "slow-control", label: "Slow control" }, code: "slow-control" },
  ])("$label", ({ body, code }) => {
    expect(subsystemSchema.parse(body).code).toBe(code);
  });

  it("refuses spaces in a code", () => {
    expect(subsystemSchema.safeParse({ code: "slow control", label: "Slow control" }).success).toBe(false);
  });
});
