import { describe, it, expect } from "vitest";
import { inflateSync } from "node:zlib";
import { crc32, tinyPng } from "@/lib/logbook/tiny-png";
import { checkFileType } from "@/lib/logbook/attachment-check";

const ascii = (s: string) => new TextEncoder().encode(s);

describe("CRC-32 of PNG chunks (ISO 3309 polynomial)", () => {
  it.each([
    { label: "check value of '123456789'", input: ascii("123456789"), crc: 0xcbf43926 }, // CRC RevEng catalogue, CRC-32/ISO-HDLC check (from memory)
    { label: "the IEND chunk type", input: ascii("IEND"), crc: 0xae426082 }, // the CRC every PNG ends with (PNG spec §11.2.5; from memory)
    { label: "empty input", input: new Uint8Array(0), crc: 0 }, // init and final XOR cancel (CRC-32 definition)
  ])("$label", ({ input, crc }) => {
    expect(crc32(input)).toBe(crc);
  });
});

describe("generated pictures", () => {
  const png = tinyPng(3, 2, (x, y) => [x * 100, y * 200, 7]);
  const view = new DataView(png.buffer);

  it("is recognised as a PNG by its signature", () => {
    expect(checkFileType("generated.png", png).contentType).toBe("image/png");
  });

  it("has an IHDR with the size and 8-bit RGB (PNG spec §11.2.2)", () => {
    expect(new TextDecoder().decode(png.subarray(12, 16))).toBe("IHDR");
    expect([view.getUint32(16), view.getUint32(20), png[24], png[25]]).toEqual([3, 2, 8, 2]); // width, height, bit depth 8, colour type 2
  });

  it("holds the pixels, one filter byte per row, after inflating IDAT (RFC 1950 zlib stream)", () => {
    const idatLength = view.getUint32(33);
    const raw = inflateSync(png.subarray(41, 41 + idatLength));
    expect(Array.from(raw)).toEqual([0, 0, 0, 7, 100, 0, 7, 200, 0, 7, 0, 0, 200, 7, 100, 200, 7, 200, 200, 7]);
  });

  it("ends with the 12-byte IEND chunk", () => {
    expect(Array.from(png.subarray(png.length - 12))).toEqual([0, 0, 0, 0, 0x49, 0x45, 0x4e, 0x44, 0xae, 0x42, 0x60, 0x82]); // PNG spec §11.2.5
  });
});
