import { ApiProperty } from '@nestjs/swagger';
import { ArrayMaxSize, IsArray, Matches } from 'class-validator';

export const MAX_HASHES_PER_ASK = 500;

export class FindMissingBlobsDto {
  @ApiProperty({
    description: `sha256 of each photo the device holds, as 64 lowercase hex digits; at most ${MAX_HASHES_PER_ASK}`,
    type: [String],
    example: ['9f86d081884c7d659a2feaa0c55ad015a3bf4f1b2b0b822cd15d6c15b0f00a08'],
  })
  @IsArray({ message: 'hashes must be a list of sha256 hashes' })
  @ArrayMaxSize(MAX_HASHES_PER_ASK, { message: `hashes must hold at most ${MAX_HASHES_PER_ASK} hashes; ask for the rest in another request` })
  @Matches(/^[0-9a-f]{64}$/, { each: true, message: 'each of hashes must be a sha256 hash: 64 lowercase hex digits' })
  hashes: string[];
}
