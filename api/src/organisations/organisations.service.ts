import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Repository } from 'typeorm';
import { definedFields, refuseEmptied } from '../common/defined-fields.js';
import { WriteQueue } from '../common/write-queue.js';
import type { UpdateOrganisationDto } from './dto/update-organisation.dto.js';
import { Organisation } from './entities/organisation.entity.js';

@Injectable()
export class OrganisationsService {
  constructor(
    @InjectRepository(Organisation) private readonly organisations: Repository<Organisation>,
    private readonly queue: WriteQueue,
  ) {}

  /** A caller may only ever see their own organisation; any other id is simply not found. */
  async findOwn(callerOrganisationId: string, id: string): Promise<Organisation> {
    const org = id === callerOrganisationId ? await this.organisations.findOneBy({ id }) : null;
    if (!org) throw new NotFoundException('No such organisation.');
    return org;
  }

  async update(callerOrganisationId: string, id: string, dto: UpdateOrganisationDto): Promise<Organisation> {
    const org = await this.findOwn(callerOrganisationId, id);
    const changes = definedFields(dto);
    if (Object.keys(changes).length === 0) throw new BadRequestException('Nothing to change.');
    refuseEmptied(changes, ['name', 'timeZone', 'photoTags', 'keepPhotoLocation']);
    Object.assign(org, changes);
    return this.queue.run((em) => em.save(org));
  }
}
