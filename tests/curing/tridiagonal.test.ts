import { describe, it } from "vitest";
import fc from "fast-check";
import { solveTridiagonal } from "../../lib/curing/tridiagonal";

describe("tridiagonal solver", () => {
  it("solves diagonally dominant systems to round-off (residual check)", () => {
    fc.assert(
      fc.property(fc.integer({ min: 2, max: 60 }), fc.integer({ min: 1, max: 1e6 }), (n, seed) => {
        let s = seed;
        const rand = () => ((s = (s * 16807) % 2147483647) / 2147483647) * 2 - 1;
        const lower = new Float64Array(n), diagonal = new Float64Array(n), upper = new Float64Array(n), rhs = new Float64Array(n);
        for (let i = 0; i < n; i++) {
          lower[i] = i > 0 ? rand() : 0;
          upper[i] = i < n - 1 ? rand() : 0;
          diagonal[i] = Math.abs(lower[i]) + Math.abs(upper[i]) + 0.5 + Math.abs(rand());
          rhs[i] = rand() * 10;
        }
        const x = new Float64Array(n);
        solveTridiagonal(lower, diagonal, upper, rhs, x, new Float64Array(n));
        for (let i = 0; i < n; i++) {
          const ax = (i > 0 ? lower[i] * x[i - 1] : 0) + diagonal[i] * x[i] + (i < n - 1 ? upper[i] * x[i + 1] : 0);
          if (Math.abs(ax - rhs[i]) > 1e-9 * (1 + Math.abs(rhs[i]))) return false;
        }
        return true;
      }),
    );
  });
});
