/**
 * Eaton sonic (Eaton 1975, SPE 5544) over a 100,000-sample log, against a bare loop of the same formula:
 * the ratio shows what validation and the number-or-array interface cost.
 */
import { timeMedian } from '../helpers/timing';
import type { BenchSection, Row } from '../helpers/types';

const SAMPLES = 100_000;

export const section: BenchSection = {
  name: 'eaton',
  async run(): Promise<Row[]> {
    // dynamic so that this section reports, rather than breaks the run, if shared/pressure changes shape
    let eatonSonic: ((input: Record<string, unknown>) => unknown) | undefined;
    try {
      const pressure = (await import('../../../shared/pressure/index')) as unknown as { eatonSonic?: typeof eatonSonic };
      eatonSonic = pressure.eatonSonic;
    } catch (error) {
      return [{ metric: `shared/pressure not loadable: ${(error as Error).message}`, ours: NaN, unit: '' }];
    }
    if (typeof eatonSonic !== 'function') return [{ metric: 'shared/pressure has no eatonSonic', ours: NaN, unit: '' }];

    const overburdenPa = new Float64Array(SAMPLES);
    const normalPa = new Float64Array(SAMPLES);
    const normalSlowness = new Float64Array(SAMPLES);
    const observedSlowness = new Float64Array(SAMPLES);
    for (let i = 0; i < SAMPLES; i++) {
      const depthM = 500 + i * 0.1524; // half-foot sampling
      overburdenPa[i] = 22_600 * depthM;
      normalPa[i] = 10_500 * depthM;
      normalSlowness[i] = 200 + 400 * Math.exp(-depthM / 1500); // µs/m
      observedSlowness[i] = normalSlowness[i] * (1 + 0.15 * Math.max(0, Math.sin(depthM / 700)));
    }
    const fn = eatonSonic;
    const ours = timeMedian(() => fn({ overburdenPa, normalPa, normalSlowness, observedSlowness, exponent: 3 }) as Float64Array, {
      repeat: 7,
    });
    const plain = timeMedian(
      () => {
        const out = new Float64Array(SAMPLES);
        for (let i = 0; i < SAMPLES; i++) {
          const s = overburdenPa[i];
          out[i] = s - (s - normalPa[i]) * (normalSlowness[i] / observedSlowness[i]) ** 3;
        }
        return out;
      },
      { repeat: 7 },
    );
    let maxDiff = 0;
    for (let i = 0; i < SAMPLES; i++) maxDiff = Math.max(maxDiff, Math.abs(ours.result[i] - plain.result[i]));
    return [
      {
        metric: `eatonSonic, ${SAMPLES.toLocaleString('en')} samples`,
        ours: ours.ms,
        reference: plain.ms,
        unit: 'ms',
        note: 'reference: bare loop of the formula',
      },
      { metric: 'max |ΔP| vs bare loop', ours: maxDiff, unit: 'Pa' },
    ];
  },
};
