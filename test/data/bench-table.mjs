// Times readTable on a large CSV (not a test; run by hand).
//   npx tsc -p tsconfig.json --outDir /tmp/fitgate-lib; ln -sfn "$PWD/node_modules" /tmp/fitgate-lib/node_modules
//   node test/data/bench-table.mjs FILE.csv [/tmp/fitgate-lib] [general]
// Make a file like the one in the report (1.25 M rows x 9 columns, printf %.10g, ~150 MB):
//   awk 'BEGIN{srand(7); print "a,b,c,d,e,f,g,h,y"; for(i=0;i<1250000;i++){ line="";
//     for(j=0;j<9;j++){ v=(rand()-0.5)*10^(int(rand()*9)-3); line = line (j? ",":"") sprintf("%.10g", v)};
//     print line}}' > big.csv
import { open, stat } from 'node:fs/promises';
import path from 'node:path';

const [file, lib = '/tmp/fitgate-lib', mode] = process.argv.slice(2);
const { readTable } = await import(path.resolve(lib, 'data', 'table.js'));

const repo = {
  label: 'bench',
  resolve: async (_from, target) => target,
  isFile: async () => true,
  size: async (p) => (await stat(p)).size,
  read: async () => {
    throw new Error('not used');
  },
  async *stream(p, chunkBytes = 1024 * 1024) {
    const handle = await open(p);
    try {
      for (;;) {
        const buffer = new Uint8Array(chunkBytes);
        const { bytesRead } = await handle.read(buffer, 0, chunkBytes);
        if (bytesRead === 0) return;
        yield buffer.subarray(0, bytesRead);
      }
    } finally {
      await handle.close();
    }
  },
  glob: async () => [],
};

const header = ['a', 'b', 'c', 'd', 'e', 'f', 'g', 'h', 'y'];
for (let run = 0; run < (mode === 'general' ? 1 : 3); run++) {
  const cpu0 = process.cpuUsage();
  const t0 = process.hrtime.bigint();
  const table = await readTable(repo, file, { columns: header, general: mode === 'general' });
  const ms = Number(process.hrtime.bigint() - t0) / 1e6;
  const cpu = process.cpuUsage(cpu0);
  const mb = (await stat(file)).size / 1e6;
  process.stdout.write(
    `${mode ?? 'fast'}: ${table.rows} rows x ${table.columns.size} columns, ${mb.toFixed(0)} MB in ${ms.toFixed(0)} ms wall, ${((cpu.user + cpu.system) / 1000).toFixed(0)} ms CPU (${(mb / (ms / 1000)).toFixed(0)} MB/s)\n`,
  );
}
