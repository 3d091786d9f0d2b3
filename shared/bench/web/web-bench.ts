import { BenchTable } from '../bench-table';
import { measureAnalyzeThroughput } from './analyze-throughput';
import { startBenchStack } from './bench-stack';
import { measureInitialTransfer } from './initial-transfer';
import { measureKeystrokeLatency } from './keystroke-latency';

/** Which web benchmarks exist; `npm run bench -- web:transfer` runs one. */
export const WEB_BENCHES = ['transfer', 'keystroke', 'throughput'] as const;
export type WebBench = (typeof WEB_BENCHES)[number];

/** Runs the web benchmarks against one throwaway stack; returns the path of the JSON written. */
export async function runWebBench(only: readonly WebBench[] = WEB_BENCHES): Promise<string> {
  const table = new BenchTable();
  const stack = await startBenchStack();
  const details: Record<string, unknown> = { baseUrl: stack.baseUrl };
  try {
    if (only.includes('transfer')) details.transfer = await measureInitialTransfer(stack.baseUrl, table);
    if (only.includes('keystroke')) details.keystroke = await measureKeystrokeLatency(stack.baseUrl, table);
    if (only.includes('throughput')) details.throughput = await measureAnalyzeThroughput(stack.baseUrl, table);
  } finally {
    await stack.stop();
  }
  return table.write('web', details);
}
