import { Module } from '@nestjs/common';
import { DemoSeeder } from './demo-seeder.js';

@Module({ providers: [DemoSeeder], exports: [DemoSeeder] })
export class SeedModule {}
