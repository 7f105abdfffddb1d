import { Global, Module } from '@nestjs/common';
import { APP_CONFIG, AppConfig, loadConfig } from './config';

let bootConfig: AppConfig | undefined;

/**
 * Hand the configuration `createApp` was given to the container, so the server uses exactly that
 * object (integration tests pass environment overrides such as SMTP_PORT) instead of re-reading
 * `process.env`.
 */
export function provideBootConfig(config: AppConfig): void {
  bootConfig = config;
}

@Global()
@Module({
  providers: [{ provide: APP_CONFIG, useFactory: () => bootConfig ?? loadConfig() }],
  exports: [APP_CONFIG],
})
export class ConfigModule {}
