// Which way a new site's array faces by default, and the warning for an array that faces the pole.
import { describe, expect, it } from "vitest";
import { equatorAzimuthDeg, poleFacingWarning } from "~/lib/site-forms";

describe("the equator's direction", () => {
  it("is south (180°) north of the equator and north (0°) south of it", () => {
    expect(equatorAzimuthDeg(46.4)).toBe(180);
    expect(equatorAzimuthDeg(-33.9)).toBe(0);
    expect(equatorAzimuthDeg(-0.5)).toBe(0);
  });
});

describe("a pole-facing array", () => {
  it("is warned about south of the equator when the array faces south", () => {
    expect(poleFacingWarning(-46, 180)).toMatch(/^This array faces the pole: tilted, it harvests less than one facing north \(0°\)/);
    expect(poleFacingWarning("-33.9", "200")).toMatch(/faces the pole/);
  });

  it("is warned about north of the equator when the array faces north", () => {
    expect(poleFacingWarning(46.4, 0)).toMatch(/facing south \(180°\)/);
    expect(poleFacingWarning(46.4, 355)).toMatch(/faces the pole/);
  });

  it("draws the line at 90° from the equator's direction, across 0°/360°", () => {
    expect(poleFacingWarning(46.4, 90)).toBeNull(); // due east: 90° from south
    expect(poleFacingWarning(46.4, 270)).toBeNull(); // due west
    expect(poleFacingWarning(46.4, 89)).toMatch(/faces the pole/);
    expect(poleFacingWarning(-20, 270)).toBeNull();
    expect(poleFacingWarning(-20, 271)).toBeNull(); // 89° from north, through 360°
    expect(poleFacingWarning(-20, 269)).toMatch(/faces the pole/);
    expect(poleFacingWarning(-20, 360)).toBeNull();
  });

  it("says nothing on the equator, for an equator-facing array, or while a figure is missing", () => {
    expect(poleFacingWarning(0, 0)).toBeNull();
    expect(poleFacingWarning(46.4, 180)).toBeNull();
    expect(poleFacingWarning(-33.9, 0)).toBeNull();
    expect(poleFacingWarning("", 0)).toBeNull();
    expect(poleFacingWarning(46.4, undefined)).toBeNull();
    expect(poleFacingWarning("abc", 0)).toBeNull();
  });
});
