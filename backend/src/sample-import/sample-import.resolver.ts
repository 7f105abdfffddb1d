import { Args, Mutation, Resolver } from '@nestjs/graphql';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { ImportSamplesInput } from './dto/import-samples.input';
import { ImportResult, SampleImportService } from './sample-import.service';

@Resolver()
export class SampleImportResolver {
  constructor(private readonly imports: SampleImportService) {}

  @Mutation('importSamples')
  importSamples(@CurrentUser() user: AuthUser, @Args('input') input: ImportSamplesInput): Promise<ImportResult> {
    return this.imports.importSamples(user, input);
  }
}
