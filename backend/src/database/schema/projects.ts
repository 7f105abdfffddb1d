import { pgTable, text } from 'drizzle-orm/pg-core';
import { id, timestamps, version } from './columns';
import { tectonicSettingEnum } from './enums';

export const projects = pgTable('projects', {
  id: id(),
  name: text('name').notNull(),
  description: text('description'),
  tectonicSetting: tectonicSettingEnum('tectonic_setting').notNull().default('SUBDUCTION_INTERFACE'),
  version: version(),
  ...timestamps,
});
