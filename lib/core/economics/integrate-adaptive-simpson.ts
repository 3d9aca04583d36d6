/** Options of {@link integrateAdaptiveSimpson}. */
export interface AdaptiveSimpsonOptions {
  /** Target error relative to the size of the integral; default 1e-10. */
  relativeTolerance?: number;
  /** Equal panels the interval is split into before adapting (guards against sampling past a feature); default 8. */
  initialPanels?: number;
  /** Deepest bisection of a panel; default 40. */
  maximumDepth?: number;
}

function simpson(width: number, left: number, middle: number, right: number): number {
  return (width / 6) * (left + 4 * middle + right);
}

/**
 * integrateAdaptiveSimpson: ∫ₐᵇ f(x) dx by adaptive Simpson quadrature.
 *
 * Formula: S(a,b) = (b−a)/6·[f(a) + 4f(m) + f(b)]; a panel is accepted when |S_left + S_right − S| ≤ 15·ε and
 * returns S_left + S_right + (S_left + S_right − S)/15 (Richardson extrapolation), otherwise it is halved with ε/2.
 * Validity: f finite on [a, b]; exact for cubics; kinks and jumps are resolved by bisection down to the maximum
 * depth. The interval is first split into `initialPanels` equal panels.
 * Source: Kuncir (1962), Comm. ACM 5(6):347, Algorithm 103 "Simpson's rule integrator"; error estimate and
 * extrapolation as in Lyness (1969), J. ACM 16(3):483–495 (from memory).
 *
 * @param fn integrand
 * @param lower lower limit
 * @param upper upper limit (may be below lower: the sign flips)
 * @returns the integral
 * @example integrateAdaptiveSimpson((x) => x * x, 0, 3) // 9
 */
export function integrateAdaptiveSimpson(
  fn: (x: number) => number,
  lower: number,
  upper: number,
  options: AdaptiveSimpsonOptions = {},
): number {
  if (lower === upper) return 0;
  if (upper < lower) return -integrateAdaptiveSimpson(fn, upper, lower, options);
  const relativeTolerance = options.relativeTolerance ?? 1e-10;
  const panels = Math.max(1, Math.floor(options.initialPanels ?? 8));
  const maximumDepth = options.maximumDepth ?? 40;
  const width = (upper - lower) / panels;

  const edges: number[] = [];
  const edgeValues: number[] = [];
  const middleValues: number[] = [];
  for (let index = 0; index <= panels; index += 1) {
    const x = index === panels ? upper : lower + index * width;
    edges.push(x);
    edgeValues.push(fn(x));
  }
  let coarse = 0;
  let scale = 0;
  for (let index = 0; index < panels; index += 1) {
    const left = edges[index] as number;
    const right = edges[index + 1] as number;
    const middleValue = fn(0.5 * (left + right));
    middleValues.push(middleValue);
    const leftValue = edgeValues[index] as number;
    const rightValue = edgeValues[index + 1] as number;
    coarse += simpson(right - left, leftValue, middleValue, rightValue);
    scale = Math.max(scale, Math.abs(leftValue), Math.abs(middleValue), Math.abs(rightValue));
  }
  const tolerance = relativeTolerance * Math.max(Math.abs(coarse), scale * (upper - lower), Number.MIN_VALUE);

  const refine = (
    left: number,
    right: number,
    leftValue: number,
    middleValue: number,
    rightValue: number,
    whole: number,
    panelTolerance: number,
    depth: number,
  ): number => {
    const middle = 0.5 * (left + right);
    const leftMiddleValue = fn(0.5 * (left + middle));
    const rightMiddleValue = fn(0.5 * (middle + right));
    const leftPart = simpson(middle - left, leftValue, leftMiddleValue, middleValue);
    const rightPart = simpson(right - middle, middleValue, rightMiddleValue, rightValue);
    const difference = leftPart + rightPart - whole;
    if (depth >= maximumDepth || Math.abs(difference) <= 15 * panelTolerance) {
      return leftPart + rightPart + difference / 15;
    }
    return (
      refine(left, middle, leftValue, leftMiddleValue, middleValue, leftPart, panelTolerance / 2, depth + 1) +
      refine(middle, right, middleValue, rightMiddleValue, rightValue, rightPart, panelTolerance / 2, depth + 1)
    );
  };

  let total = 0;
  for (let index = 0; index < panels; index += 1) {
    const left = edges[index] as number;
    const right = edges[index + 1] as number;
    const leftValue = edgeValues[index] as number;
    const middleValue = middleValues[index] as number;
    const rightValue = edgeValues[index + 1] as number;
    const whole = simpson(right - left, leftValue, middleValue, rightValue);
    total += refine(left, right, leftValue, middleValue, rightValue, whole, tolerance / panels, 0);
  }
  return total;
}
