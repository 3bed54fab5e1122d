// Runs every solver benchmark in turn. Prints figures only; never fails a build.
import { cpus } from 'node:os';
import { runCaptureBench } from './capture-io.bench.js';
import { runPoseEstimateBench } from './pose-estimate.bench.js';
import { runSkinningBench } from './skinning.bench.js';

console.log(
  `solver benchmarks: Node ${process.version}, ${cpus().length} cores, ${cpus()[0]?.model}`,
);
await runSkinningBench();
await runCaptureBench();
await runPoseEstimateBench();
