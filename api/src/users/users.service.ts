import { BadRequestException, ConflictException, ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Brackets, IsNull, Repository } from 'typeorm';
import { RefreshToken } from '../auth/entities/refresh-token.entity.js';
import { definedFields, refuseEmptied } from '../common/defined-fields.js';
import { WriteQueue } from '../common/write-queue.js';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import type { CreateUserDto } from './dto/create-user.dto.js';
import type { ListUsersQueryDto } from './dto/list-users-query.dto.js';
import type { UpdateUserDto } from './dto/update-user.dto.js';
import { Person } from './entities/person.entity.js';
import { type PublicUser, toPublicUser, User } from './entities/user.entity.js';
import { PasswordResetService } from './password-reset.service.js';
import { textLike } from '../database/sql.js';

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

@Injectable()
export class UsersService {
  constructor(
    @InjectRepository(User) private readonly users: Repository<User>,
    private readonly queue: WriteQueue,
    private readonly resets: PasswordResetService,
  ) {}

  async list(organisationId: string, q: ListUsersQueryDto): Promise<Page<PublicUser>> {
    const qb = this.users.createQueryBuilder('u').where('u.organisationId = :organisationId', { organisationId });
    if (q.role) qb.andWhere('u.role = :role', { role: q.role });
    if (q.search) {
      const like = `%${q.search.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
      qb.andWhere(new Brackets((b) => b.where(textLike('u.name', 'like'), { like }).orWhere(textLike('u.email', 'like'), { like })));
    }
    const [rows, total] = await qb
      .orderBy('u.name', 'ASC')
      .skip((q.page - 1) * q.pageSize)
      .take(q.pageSize)
      .getManyAndCount();
    return { items: rows.map(toPublicUser), total, page: q.page, pageSize: q.pageSize };
  }

  async directory(organisationId: string): Promise<Array<{ id: string; name: string; role: string; active: boolean }>> {
    const rows = await this.users.find({ where: { organisationId }, order: { name: 'ASC' }, select: { id: true, name: true, role: true, active: true } });
    return rows.map(({ id, name, role, active }) => ({ id, name, role, active }));
  }

  /** 404 for a row of another organisation: its existence is not ours to reveal. */
  async findOne(organisationId: string, id: string): Promise<PublicUser> {
    const user = await this.users.findOneBy({ id, organisationId });
    if (!user) throw new NotFoundException('No such user.');
    return toPublicUser(user);
  }

  /**
   * Adds someone to the caller's organisation by e-mail. A person who already signs in for another organisation
   * joins with the password they have; anyone else is sent a link to set one. The answer is the same either way:
   * whether an address is known elsewhere is not this organisation's to learn.
   */
  async create(caller: AuthUser, dto: CreateUserDto): Promise<PublicUser> {
    const user = await this.queue.run(async (em) => {
      if (await em.existsBy(User, { organisationId: caller.organisationId, email: dto.email })) {
        throw new ConflictException('Someone with that e-mail address is already in your team.');
      }
      const known = await em.findOneBy(Person, { email: dto.email });
      // No password until the person sets one from their link: sign-in compares against a decoy meanwhile.
      const person = known ?? (await em.save(em.create(Person, { email: dto.email, passwordHash: '' })));
      const user = await em.save(em.create(User, {
        organisationId: caller.organisationId,
        personId: person.id,
        email: dto.email,
        name: dto.name,
        role: dto.role,
        active: true,
        lastSignInAt: null,
      }));
      await this.resets.welcome(em, caller, user, !known);
      return user;
    });
    return toPublicUser(user);
  }

  async update(caller: AuthUser, id: string, dto: UpdateUserDto): Promise<PublicUser> {
    const user = await this.users.findOneBy({ id, organisationId: caller.organisationId });
    if (!user) throw new NotFoundException('No such user.');
    const changes = definedFields(dto);
    if (Object.keys(changes).length === 0) throw new BadRequestException('Nothing to change: send name, role or active.');
    refuseEmptied(changes, ['name', 'role', 'active']);
    if (id === caller.id && dto.role !== undefined && dto.role !== user.role) {
      throw new ForbiddenException('You cannot change your own role; ask another admin.');
    }
    if (id === caller.id && dto.active === false) {
      throw new ForbiddenException('You cannot deactivate yourself; ask another admin.');
    }
    Object.assign(user, changes);
    await this.queue.run(async (em) => {
      await em.save(user);
      if (dto.active === false) await em.update(RefreshToken, { userId: user.id, revokedAt: IsNull() }, { revokedAt: new Date() });
    });
    return toPublicUser(user);
  }
}
