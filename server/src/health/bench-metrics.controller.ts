import { Controller, Get, HttpCode, HttpStatus, Inject, Post } from '@nestjs/common';
import { ConfigType } from '@nestjs/config';
import { monitorEventLoopDelay } from 'node:perf_hooks';
import { ApiException } from '../common/api-error';
import { Public } from '../common/decorators';
import { appConfig } from '../config/app.config';

/** Event-loop delay and memory for `npm run bench`; answers 404 unless BENCH_METRICS=true. */
@Controller('bench/metrics')
export class BenchMetricsController {
  private readonly loop = monitorEventLoopDelay({ resolution: 10 });

  constructor(@Inject(appConfig.KEY) private readonly config: ConfigType<typeof appConfig>) {
    if (config.benchMetrics) this.loop.enable();
  }

  @Public()
  @Get()
  read(): { eventLoopP99Ms: number; heapUsed: number; rss: number } {
    this.guard();
    (globalThis as { gc?: () => void }).gc?.(); // with --expose-gc, heap after collection
    const m = process.memoryUsage();
    // Samples include the 10 ms sampling interval itself; the delay is what lies beyond it.
    return { eventLoopP99Ms: Math.max(0, this.loop.percentile(99) / 1e6 - 10), heapUsed: m.heapUsed, rss: m.rss };
  }

  @Public()
  @Post('reset')
  @HttpCode(HttpStatus.OK)
  reset(): { ok: true } {
    this.guard();
    this.loop.reset();
    return { ok: true };
  }

  private guard(): void {
    if (!this.config.benchMetrics) throw new ApiException(HttpStatus.NOT_FOUND, 'not_found', 'Cannot GET /api/bench/metrics');
  }
}
