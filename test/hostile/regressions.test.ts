// Regressions found by fuzzing (test/hostile/fuzz.test.ts), kept as named fixtures: each must end
// with an exit status and a report, never hang or crash.
import { describe, expect, it } from 'vitest';
import { runPipeline } from '../../src/run/pipeline.js';
import { createMemoryRepository } from '../../src/repo/memory-repository.js';
import { formatHtml } from '../../src/report/html.js';
import { exitStatus } from '../../src/result/result.js';
import { defaultSettings } from '../../src/run/settings.js';

/** Seed 7: duplicate radial columns (a constant input with centres at the samples) left subnormal
 * entries in a fold factor, and the SVD iteration of the complexity sweep never converged. */
const SUBNORMAL_FACTOR: Record<string, string> = {
  'data/train.csv':
    'x,y,z\n0,0.8,1\n1,3,1\n2,5.2,1\n3,6.9,1\n4,9.1,1\n5,10.8,1\n6,13,1\n7,15.2,1\n8,16.9,1\n9,19.1,1\n10,20.8,1\n11,23,1\n12,25.2,1\n13,26.9,1\n14,29.1,1\n15,30.8,1\n16,33,1\n17,35.2,1\n18,36.9,1\n19,39.1,1\n20,40.8,1\n21,43,1\n22,45.2,1\n23,46.9,1\n24,49.1,1\n25,50.8,1\n26,53,1\n27,55.2,1\n28,56.9,1\n',
  'data/holdout.csv': 'x,y,z\n0,0.8,1\n1,3,1\n2,5.2,1\n3,6.9,1\n',
  'models/d0.model.yml':
    'version: 1\nname: q\ndata:\n  train: ../data/train.csv\n  holdout: ../data/holdout.csv\n  target: y\nterms:\n  - polynomial: { of: x, degree: 4 }\n  - rbf: { of: x, centers: { from: 0, to: 30, count: 1 }, width: 0.20072836880624362 }\n  - rbf: { of: z, centers: at-samples, width: 3.4436521793676405 }\n',
};

/** Seed 11: a coefficient limit of 1e308 padded the bar chart's log axis to Infinity. */
const HUGE_LIMIT: Record<string, string> = {
  'data/train.csv': 'x,y,z\n0,0.8,1\n1,3,1\n2,5.2,1\n3,6.9,1\n4,9.1,1\n5,10.8,1\n',
  'data/holdout.csv': 'y,x\n0,0.8\n1,3\n2,5.2\n3,6.9\n4,9.1\n5,10.8\n',
  'fitgate.yml': 'version: 1\nmodels: ["models/*.model.yml"]\n',
  'models/d0.model.yml':
    'version: 1\nname: q\ndata:\n  train: ../data/train.csv\n  holdout: ../data/holdout.csv\n  target: y\nterms:\n  - linear: [x]\nlimits:\n  coefficient: 1e308\n  reproducibility: off\n',
};

describe('fuzzing regressions', () => {
  it.each([
    ['subnormal entries in a fold factor (should not hang)', SUBNORMAL_FACTOR],
    ['a limit of 1e308 on a chart axis (should not crash)', HUGE_LIMIT],
  ])(
    '%s',
    async (_, files) => {
      const result = await runPipeline(defaultSettings('/repo'), createMemoryRepository(files));
      expect([0, 1]).toContain(exitStatus(result));
      expect(result.models[0].error).toBeNull();
      expect(formatHtml(result)).toContain('</html>');
    },
    30_000,
  );
});
