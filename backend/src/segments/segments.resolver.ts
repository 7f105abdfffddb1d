import { Args, Int, Mutation, Query, Resolver } from '@nestjs/graphql';
import { AuthUser } from '../auth/auth-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { CreateSegmentInput, UpdateSegmentInput } from './dto/create-segment.input';
import { SegmentRow } from './segments.repository';
import { SegmentsService } from './segments.service';

@Resolver('Segment')
export class SegmentsResolver {
  constructor(private readonly segments: SegmentsService) {}

  @Query('segment')
  get(@CurrentUser() user: AuthUser, @Args('id') id: string): Promise<SegmentRow> {
    return this.segments.get(user, id);
  }

  @Mutation('createSegment')
  create(@CurrentUser() user: AuthUser, @Args('input') input: CreateSegmentInput): Promise<SegmentRow> {
    return this.segments.create(user, input);
  }

  @Mutation('updateSegment')
  update(
    @CurrentUser() user: AuthUser,
    @Args('id') id: string,
    @Args('version', { type: () => Int }) version: number,
    @Args('input') input: UpdateSegmentInput,
  ): Promise<SegmentRow> {
    return this.segments.update(user, id, version, input);
  }

  @Mutation('deleteSegment')
  delete(@CurrentUser() user: AuthUser, @Args('id') id: string): Promise<boolean> {
    return this.segments.delete(user, id);
  }
}
