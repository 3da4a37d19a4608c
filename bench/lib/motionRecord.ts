/**
 * A long damper-dyno style record for the CSV benchmarks: time, stroke and force with a units
 * row and uneven sampling (about 1 kHz ± 20 %), two stroke harmonics and force noise. Timing
 * data only; not handbook content.
 */
export function motionRecord(rows: number): string {
  const out = ['# bench record', 'time [s],stroke [mm],force [kN]', 's,mm,kN'];
  let t = 0;
  for (let i = 0; i < rows; i++) {
    t += 0.001 * (1 + 0.2 * Math.sin(1.7 * i)); // uneven sampling
    const x = 25 * Math.sin(2 * Math.PI * 1.3 * t) + 3 * Math.sin(2 * Math.PI * 11 * t);
    const F = 1.2 * Math.cos(2 * Math.PI * 1.3 * t) + 0.05 * Math.sin(97 * t);
    out.push(`${t.toFixed(6)},${x.toFixed(4)},${F.toFixed(5)}`);
  }
  return out.join('\n');
}
