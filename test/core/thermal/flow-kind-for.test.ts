import { describe, expect, it } from "vitest";
import { flowKindFor } from "../../../lib/core/thermal";

describe("flowKindFor", () => {
  it("maps symmetric arrangements regardless of which stream is Cmin", () => {
    // naming of Incropera 6e Table 11.3
    for (const cminStream of ["hot", "cold"] as const) {
      expect(flowKindFor({ kind: "counterflow" }, cminStream)).toBe("counterflow");
      expect(flowKindFor({ kind: "parallel" }, cminStream)).toBe("parallel");
      expect(flowKindFor({ kind: "crossflow-unmixed" }, cminStream)).toBe("crossflow-unmixed");
      expect(flowKindFor({ kind: "shell-and-tube", shells: 3 }, cminStream)).toEqual({ shells: 3 });
    }
  });

  it("calls mixed crossflow Cmin-mixed when the mixed stream is the Cmin stream, else Cmax-mixed", () => {
    // Incropera 6e Table 11.3 distinguishes Cmax mixed / Cmin unmixed from Cmin mixed / Cmax unmixed
    expect(flowKindFor({ kind: "crossflow-mixed", mixedStream: "hot" }, "hot")).toBe("crossflow-cmin-mixed");
    expect(flowKindFor({ kind: "crossflow-mixed", mixedStream: "hot" }, "cold")).toBe("crossflow-cmax-mixed");
    expect(flowKindFor({ kind: "crossflow-mixed", mixedStream: "cold" }, "cold")).toBe("crossflow-cmin-mixed");
    expect(flowKindFor({ kind: "crossflow-mixed", mixedStream: "cold" }, "hot")).toBe("crossflow-cmax-mixed");
  });

  it("rejects a shell count that is not a whole number of at least 1", () => {
    expect(() => flowKindFor({ kind: "shell-and-tube", shells: 0 }, "hot")).toThrow(
      "number of shells must be a whole number of at least 1, got 0",
    );
  });
});
