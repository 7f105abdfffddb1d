import { Injectable } from '@nestjs/common';
import { JobKind, RunKind } from './run-kind';

/**
 * Every kind of job this process knows. Features register their kinds when their module starts
 * (`onModuleInit`); the worker, the reaper and the queue read them from here, so this folder never
 * imports a feature.
 */
@Injectable()
export class JobRegistry {
  private readonly byQueue = new Map<string, JobKind>();

  register(kind: JobKind): void {
    const existing = this.byQueue.get(kind.queue);
    if (existing && existing !== kind) throw new Error(`two job kinds use the queue ${kind.queue}`);
    this.byQueue.set(kind.queue, kind);
  }

  all(): JobKind[] {
    return [...this.byQueue.values()];
  }

  runKinds(): RunKind[] {
    return this.all().filter((kind): kind is RunKind => kind.type === 'run');
  }
}
