import { Body, Controller, HttpCode, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser } from '../common/decorators/current-user.decorator.js';
import { AnyRole } from '../common/decorators/roles.decorator.js';
import { FindMissingBlobsDto } from './dto/find-missing-blobs.dto.js';
import { PhotosService } from './photos.service.js';

/** Photo bytes by hash: a device asks which of its photos the server still lacks before sending any. */
@ApiTags('photos')
@ApiBearerAuth()
@AnyRole()
@Controller('blobs')
export class BlobsController {
  constructor(private readonly photos: PhotosService) {}

  @Post('missing')
  @HttpCode(200)
  missing(@CurrentUser() user: AuthUser, @Body() dto: FindMissingBlobsDto) {
    return this.photos.missing(user, dto.hashes);
  }
}
