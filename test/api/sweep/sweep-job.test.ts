/** docker/k8s/sweep-job.yaml: parses, and pod i of the Indexed Job runs the CLI on shard i of the completions count. */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { parseAllDocuments } from 'yaml';
import { parseShard } from '../../../src/cli/sweep.js';
import { planSweep, shardSlice } from '../../../src/api/sweep/plan.js';

const docs = parseAllDocuments(readFileSync(new URL('../../../docker/k8s/sweep-job.yaml', import.meta.url), 'utf8')).map((d) => d.toJS());
const job = docs.find((d) => d.kind === 'Job');
const container = job.spec.template.spec.containers[0];

/** The pod's command line after the shell expands the variables the Job sets (a plain $NAME substitution). */
function podArguments(index: number): string[] {
  const env: Record<string, string> = { JOB_COMPLETION_INDEX: String(index) };
  for (const e of container.env as { name: string; value: string }[]) env[e.name] = e.value;
  const script = (container.args as string[]).join(' ').replace(/\$(\w+)/g, (_m, name: string) => env[name] ?? '');
  return [...script.matchAll(/"([^"]*)"|(\S+)/g)].map((m) => m[1] ?? m[2]!);
}

describe('sweep Job manifest', () => {
  it('is an Indexed Job of the CLI sweep with NDJSON to a volume', () => {
    expect(job.apiVersion).toBe('batch/v1');
    expect(job.spec.completionMode).toBe('Indexed');
    expect(job.spec.template.spec.restartPolicy).toBe('Never');
    const args = podArguments(0);
    expect(args.slice(0, 4)).toEqual(['exec', 'node', 'bin/oilskin.js', 'sweep']);
    const output = args[args.indexOf('--ndjson') + 1]!;
    const mount = container.volumeMounts.find((m: { mountPath: string }) => output.startsWith(`${m.mountPath}/`));
    const volume = job.spec.template.spec.volumes.find((v: { name: string }) => v.name === mount.name);
    const claim = docs.find((d) => d.kind === 'PersistentVolumeClaim');
    expect(volume.persistentVolumeClaim.claimName).toBe(claim.metadata.name);
  });

  it('pod i computes shard i of completions; the slices tile the sweep; each pod writes its own file', () => {
    const n = job.spec.completions;
    const outputs = new Set<string>();
    let next = 0;
    for (let i = 0; i < n; i++) {
      const args = podArguments(i);
      expect(parseShard(args[args.indexOf('--shard') + 1]!)).toEqual({ index: i, count: n });
      outputs.add(args[args.indexOf('--ndjson') + 1]!);
      const slice = shardSlice(40_000, i, n);
      expect(slice.start).toBe(next);
      next = slice.end;
    }
    expect(next).toBe(40_000);
    expect(outputs.size).toBe(n);
  });

  it('the example sweep in the ConfigMap is a valid request at the path the pods read', () => {
    const configMap = docs.find((d) => d.kind === 'ConfigMap');
    const args = podArguments(0);
    const file = args[args.indexOf('sweep') + 1]!;
    const mount = container.volumeMounts.find((m: { mountPath: string }) => file.startsWith(`${m.mountPath}/`));
    const volume = job.spec.template.spec.volumes.find((v: { name: string }) => v.name === mount.name);
    expect(volume.configMap.name).toBe(configMap.metadata.name);
    const plan = planSweep(JSON.parse(configMap.data[file.slice(mount.mountPath.length + 1)]));
    expect(plan.totalPoints).toBe(40_000);
  });
});
