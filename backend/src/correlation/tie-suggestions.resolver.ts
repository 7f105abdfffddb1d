import { Args, Query, Resolver } from '@nestjs/graphql';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { TieSuggestionsInput } from './dto/tie-suggestions.input';
import { TieSuggestionsService, type TieSuggestionView } from './tie-suggestions.service';

@Resolver('TieSuggestion')
export class TieSuggestionsResolver {
  constructor(private readonly suggestions: TieSuggestionsService) {}

  @Query('tieSuggestions')
  suggest(@CurrentUser() user: AuthUser, @Args('input') input: TieSuggestionsInput): Promise<TieSuggestionView[]> {
    return this.suggestions.suggest(user, input);
  }
}
