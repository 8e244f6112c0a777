/**
 * The bench's yardstick (started by http-bench.ts, not part of the app): NestJS on Express as the
 * app uses it, with nothing of Thermbay's — no helmet, no guards, no validation, no database. It
 * answers GET /api/health with a small JSON and POST /api/estimates (any JSON body) with the answer
 * the real app gave to the bench's estimate, read once from the file BENCH_FLOOR_ANSWER and
 * serialised afresh on every request, as the real route does. Its requests/s and p99 are the most
 * the framework on this machine allows for an answer of that size: the real routes are measured
 * against it. Listens on BENCH_FLOOR_PORT.
 */
import 'reflect-metadata';
import { Body, Controller, Get, HttpCode, Module, Post } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import { readFileSync } from 'node:fs';

const answer = JSON.parse(readFileSync(process.env.BENCH_FLOOR_ANSWER ?? '', 'utf8')) as object;

@Controller('api')
class FloorController {
  @Get('health')
  health(): object {
    return { status: 'ok', version: '0.1.0' };
  }

  @Post('estimates')
  @HttpCode(200)
  estimate(@Body() body: object): object {
    return body ? answer : {};
  }
}

@Module({ controllers: [FloorController] })
class FloorModule {}

async function start(): Promise<void> {
  const app = await NestFactory.create(FloorModule, { logger: false });
  await app.listen(Number(process.env.BENCH_FLOOR_PORT ?? 3902), '127.0.0.1');
}

void start();
