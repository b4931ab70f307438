import { ApiProperty } from '@nestjs/swagger';
import type { Mutation } from '@wiretrail/core';
import { IsArray, IsString, Matches } from 'class-validator';

export const DEVICE_ID = /^[A-Za-z0-9_-]{4,64}$/;

export class PushDto {
  @ApiProperty({ example: 'd7f3a1c2' })
  @IsString()
  @Matches(DEVICE_ID, { message: 'deviceId must be 4 to 64 letters, digits, _ or -' })
  deviceId: string;

  /**
   * Each mutation is checked on its own by the engine, so that one bad mutation is refused alone instead of failing
   * the batch; the handler takes them from PushedMutations, and the pipe sees an empty list here (pushed-mutations.ts).
   */
  @ApiProperty({
    description: 'In the order the device made them: { mutationId, entity, id, baseVersion, set?, delete?, hlc }',
    type: 'array',
    items: { type: 'object' },
  })
  @IsArray({ message: 'mutations must be a list' })
  mutations: Mutation[];
}
