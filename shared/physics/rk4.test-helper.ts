// Classical fourth-order Runge–Kutta, used by tests as an independent check on closed-form solutions.
export function integrateRk4(derivative: (state: number[]) => number[], initial: number[], time_s: number, steps: number): number[] {
  const h = time_s / steps;
  let y = [...initial];
  const add = (a: number[], b: number[], scale: number) => a.map((value, i) => value + scale * b[i]);
  for (let i = 0; i < steps; i++) {
    const k1 = derivative(y);
    const k2 = derivative(add(y, k1, h / 2));
    const k3 = derivative(add(y, k2, h / 2));
    const k4 = derivative(add(y, k3, h));
    y = y.map((value, j) => value + (h / 6) * (k1[j] + 2 * k2[j] + 2 * k3[j] + k4[j]));
  }
  return y;
}
