import { describe, expect, it } from "vitest";
import { hashPassword, hashToken, newToken, verifyPassword } from "@/lib/auth/secrets";
import { clientAddress, isBlocked, MAX_ACCOUNT_FAILURES, throttleKeys } from "@/lib/auth/throttle";

describe("token hashing", () => {
  // SHA-256 test vectors from NIST FIPS 180-2, appendix B.1 ("abc") and the empty message (common practice).
  it.each([
    { label: "FIPS 180-2 'abc'", input: "abc", hex: "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad" },
    { label: "empty message", input: "", hex: "e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855" },
  ])("$label", ({ input, hex }) => {
    expect(hashToken(input)).toBe(hex);
  });

  it("a new token is random, prefixed, and stored only as its hash", () => {
    const a = newToken("dsk_");
    const b = newToken("dsk_");
    expect(a.token.startsWith("dsk_")).toBe(true);
    expect(a.token).not.toBe(b.token);
    expect(a.hash).toBe(hashToken(a.token));
    expect(a.hash).toMatch(/^[0-9a-f]{64}$/);
  });
});

describe("password hashing (bcrypt)", () => {
  it("verifies the right password and refuses a wrong one", async () => {
    const hash = await hashPassword("quillon-test-pw");
    expect(hash).toMatch(/^\$2[aby]\$11\$/); // bcrypt modular crypt format with cost 11 (common practice)
    expect(await verifyPassword("quillon-test-pw", hash)).toBe(true);
    expect(await verifyPassword("quillon-test-pX", hash)).toBe(false);
  });
});

describe("sign-in throttle", () => {
  const keys = throttleKeys(" Mara@Example.org ", "direct");
  it.each([
    { label: "no failures", account: 0, address: 0, blocked: false },
    { label: "four account failures", account: 4, address: 4, blocked: false },
    { label: "five account failures block the sixth try", account: 5, address: 5, blocked: true },
    { label: "many address failures across accounts", account: 0, address: 30, blocked: true },
    { label: "address just under its limit", account: 0, address: 29, blocked: false },
  ])("$label", ({ account, address, blocked }) => {
    const counts = new Map([
      [keys.account, account],
      [keys.address, address],
    ]);
    expect(isBlocked(counts, keys)).toBe(blocked);
  });

  it("keys are case-insensitive on the e-mail", () => {
    expect(keys.account).toBe("account:mara@example.org");
    expect(MAX_ACCOUNT_FAILURES).toBe(5);
  });

  it.each([
    { label: "forwarded header ignored without a trusted proxy", headers: { "x-forwarded-for": "10.0.0.7" }, trust: false, expected: "direct" },
    { label: "first forwarded address behind a trusted proxy", headers: { "x-forwarded-for": "10.0.0.7, 10.0.0.1" }, trust: true, expected: "10.0.0.7" },
    { label: "x-real-ip when no forwarded header", headers: { "x-real-ip": "10.0.0.9" }, trust: true, expected: "10.0.0.9" },
    { label: "no headers at all", headers: {}, trust: true, expected: "direct" },
  ])("$label", ({ headers, trust, expected }) => {
    expect(clientAddress(headers, trust)).toBe(expected);
  });
});
