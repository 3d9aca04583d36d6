import { describe, expect, it } from "vitest";
import { correctedAkaike } from "../../../lib/core/trend";

describe("correctedAkaike", () => {
  it("follows the Hurvich–Tsai formula", () => {
    // Hurvich & Tsai 1989 formula, computed by hand: 5·ln(2.4/5) + 2·3 + 2·3·4/(5 − 3 − 1) = 26.3301541 (ln 0.48 = −0.73396918)
    expect(Math.abs((correctedAkaike(2.4, 5, 2) as number) - 26.3301541)).toBeLessThan(1e-7);
    expect(correctedAkaike(2.4, 4, 2)).toBeNull();
  });
});
