import type { SigmaCheck } from '../../schemas/surfaces';
import type { LeaveOneOutResidual } from '../leaveOneOut';

/** RMS of error/σ beyond which σ is called too small or too large: a factor of about 1.4 either way (common practice, no source). */
const TOO_SMALL_RMS_Z = 1.4;
const TOO_LARGE_RMS_Z = 0.7;

/**
 * How leave-one-out errors compare with kriging's own σ for them, and a plain verdict.
 * @example sigmaCheck([{ index: 0, observed: 0, predicted: 1, residual: 1, stdDev: 1 }])?.verdict; // 'about right'
 */
export function sigmaCheck(residuals: readonly LeaveOneOutResidual[]): SigmaCheck | null {
  const z = residuals.filter((r) => r.stdDev !== undefined && r.stdDev > 0).map((r) => r.residual / r.stdDev!);
  if (z.length === 0) return null;
  const rmsZ = Math.sqrt(z.reduce((s, v) => s + v * v, 0) / z.length);
  return {
    rmsZ,
    within1: z.filter((v) => Math.abs(v) <= 1).length / z.length,
    within2: z.filter((v) => Math.abs(v) <= 2).length / z.length,
    verdict: rmsZ > TOO_SMALL_RMS_Z ? 'too small' : rmsZ < TOO_LARGE_RMS_Z ? 'too large' : 'about right',
  };
}
