// Runs every solver benchmark in turn. Prints figures only; never fails a build.
import { runCaptureBench } from './capture-io.bench.js';
import { runPoseEstimateBench } from './pose-estimate.bench.js';
import { runSkinningBench } from './skinning.bench.js';

await runSkinningBench();
await runCaptureBench();
await runPoseEstimateBench();
