import 'server-only';
// The worker side of the model-fitting pool (lib/matches/fitPool.ts): bundled
// by scripts/build-worker.ts and run in a worker thread by piscina, so a refit
// of the shop's colorant model (a few hundred milliseconds on a big shop)
// never holds up the request thread.
import { fitColorantModel } from '../color/fitColorantModel';
import type { ColorantModel, DoseObservation } from '../color/types';

export type FitTask = { observations: DoseObservation[]; previous: ColorantModel | null };

export default function fitTask(task: FitTask): ColorantModel | null {
  return fitColorantModel(task.observations, task.previous);
}
