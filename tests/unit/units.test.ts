/** Display units, against the exact definitions: 1 ft = 0.3048 m, 1 mi = 1609.344 m, 1 lb = 0.45359237 kg (1959 agreement, NIST SP 811). */
import { expect, it } from "vitest";
import { formatDistance, formatElevation, formatGrade, formatMass, formatSpeed, formatTemperature } from "@/lib/units";

it("formats in metric and imperial", () => {
  expect(formatDistance(12_345, "metric")).toBe("12.3 km");
  expect(formatDistance(1609.344 * 26.2, "imperial")).toBe("26.2 mi");
  expect(formatElevation(1000, "imperial")).toBe("3,281 ft");
  expect(formatGrade(-0.085)).toBe("-8.5 %");
  expect(formatSpeed(80 / 3.6, "metric")).toBe("80 km/h");
  expect(formatSpeed(1609.344 * 50 / 3600, "imperial")).toBe("50 mph");
  expect(formatTemperature(100, "imperial")).toBe("212 °F"); // water boils at 100 °C = 212 °F at 1 atm
  expect(formatMass(1000, "imperial")).toBe("2,205 lb");
});
