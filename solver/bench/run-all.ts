// Runs every solver benchmark in turn. Prints figures only; never fails a build.
import { cpus } from 'node:os';
import { runCaptureBench } from './capture-io.bench.js';
import { runPoseEstimateBench } from './pose-estimate.bench.js';
// Retarget and live tuning.
import { runRetargetBench } from './retarget.bench.js';
import { runSkinningBench } from './skinning.bench.js';
// Learn.
import { runLearnBench } from './learn.bench.js';
import { runProductKernelBench } from './product-kernels.bench.js';

console.log(
  `solver benchmarks: Node ${process.version}, ${cpus().length} cores, ${cpus()[0]?.model}`,
);
await runSkinningBench();
await runCaptureBench();
await runPoseEstimateBench();
// Retarget and live tuning.
await runRetargetBench();
// Learn.
await runProductKernelBench();
await runLearnBench();
