/** Global setup: the compute pool loads its worker from a file, so build it once per test run. */
import { buildComputeWorker } from "@/lib/server/compute/build-worker";
import { computeWorkerFile } from "@/lib/server/compute/worker-file";

export default function setup(): void {
  buildComputeWorker(computeWorkerFile());
}
