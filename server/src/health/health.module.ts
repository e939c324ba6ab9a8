import { Module } from '@nestjs/common';
import { BenchMetricsController } from './bench-metrics.controller';
import { HealthController } from './health.controller';

@Module({ controllers: [HealthController, BenchMetricsController] })
export class HealthModule {}
