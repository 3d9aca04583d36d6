import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { householderQr, leastSquaresSolve, unscaledCovariance } from "../../../lib/core/fit";

/** A random m×n matrix (row-major) with entries in [−1, 1] plus a diagonal boost, so it has full column rank. */
const matrixArbitrary = fc
  .tuple(fc.integer({ min: 2, max: 6 }), fc.integer({ min: 0, max: 8 }))
  .chain(([columns, extraRows]) => {
    const rows = columns + extraRows;
    return fc.record({
      rows: fc.constant(rows),
      columns: fc.constant(columns),
      values: fc.array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: rows * columns, maxLength: rows * columns }),
      response: fc.array(fc.double({ min: -10, max: 10, noNaN: true }), { minLength: rows, maxLength: rows }),
    });
  })
  .map(({ rows, columns, values, response }) => {
    const matrix = values.map((value, index) => (Math.floor(index / columns) === index % columns ? value + 3 : value));
    return { rows, columns, matrix, response };
  });

describe("householderQr", () => {
  it("gives least-squares residuals orthogonal to every column (normal equations, property test)", () => {
    // definition of the least-squares solution: Aᵀ(b − A·x) = 0; tolerance 1e-10 of the data scale
    fc.assert(
      fc.property(matrixArbitrary, ({ rows, columns, matrix, response }) => {
        const { solution } = leastSquaresSolve(householderQr(matrix, rows, columns), response);
        for (let j = 0; j < columns; j += 1) {
          let dot = 0;
          for (let i = 0; i < rows; i += 1) {
            let fitted = 0;
            for (let k = 0; k < columns; k += 1) fitted += (matrix[i * columns + k] as number) * (solution[k] as number);
            dot += (matrix[i * columns + j] as number) * ((response[i] as number) - fitted);
          }
          expect(Math.abs(dot)).toBeLessThan(1e-10 * (1 + rows * 10));
        }
      }),
    );
  });

  it("gives (AᵀA)⁻¹ from the R factor (round trip AᵀA·C = I, property test)", () => {
    // identity check; tolerance 1e-10 for the well-conditioned matrices generated here
    fc.assert(
      fc.property(matrixArbitrary, ({ rows, columns, matrix }) => {
        const covariance = unscaledCovariance(householderQr(matrix, rows, columns)) as number[][];
        for (let a = 0; a < columns; a += 1) {
          for (let b = 0; b < columns; b += 1) {
            let sum = 0;
            for (let k = 0; k < columns; k += 1) {
              let gram = 0;
              for (let i = 0; i < rows; i += 1) gram += (matrix[i * columns + a] as number) * (matrix[i * columns + k] as number);
              sum += gram * ((covariance[k] as number[])[b] as number);
            }
            expect(Math.abs(sum - (a === b ? 1 : 0))).toBeLessThan(1e-10);
          }
        }
      }),
    );
  });

  it("detects a repeated column as rank deficiency", () => {
    const decomposition = householderQr([1, 1, 2, 2, 3, 3], 3, 2);
    expect(decomposition.rank).toBe(1);
    expect(unscaledCovariance(decomposition)).toBeNull();
  });

  it("rejects a matrix whose size does not match", () => {
    expect(() => householderQr([1, 2, 3], 2, 2)).toThrow("householderQr: a 2×2 matrix needs 4 values, got 3");
  });
});
