import { Inject, Injectable, OnApplicationBootstrap, OnModuleDestroy } from '@nestjs/common';
import { APP_CONFIG, AppConfig } from '../config/config';
import { RefreshService } from './refresh.service';

/** How often an API process moves active refreshes on and looks for projects to refresh automatically. */
export const REFRESH_TICK_MS = 3_000;

/**
 * Moves refresh plans on in the background. Every API replica runs it; each step move is
 * conditional, so replicas ticking together do no harm. Tests drive plans themselves (off there).
 */
@Injectable()
export class RefreshTicker implements OnApplicationBootstrap, OnModuleDestroy {
  private timer: NodeJS.Timeout | undefined;
  private running = false;

  constructor(
    private readonly refresh: RefreshService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  onApplicationBootstrap(): void {
    if (this.config.nodeEnv === 'test') return;
    this.timer = setInterval(() => void this.tick(), REFRESH_TICK_MS);
    this.timer.unref();
  }

  onModuleDestroy(): void {
    if (this.timer) clearInterval(this.timer);
  }

  async tick(): Promise<void> {
    if (this.running) return;
    this.running = true;
    try {
      await this.refresh.advanceAll();
      await this.refresh.refreshAutomatically();
    } catch {
      // The next tick tries again (the database may be restarting).
    } finally {
      this.running = false;
    }
  }
}
