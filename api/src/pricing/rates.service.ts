import { BadRequestException, ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import type { BillingTerms } from '@wiretrail/core';
import type { EntityManager } from 'typeorm';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { definedFields, refuseEmptied } from '../common/defined-fields.js';
import { WriteQueue } from '../common/write-queue.js';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import type { CreateLabourRateDto } from './dto/create-labour-rate.dto.js';
import type { CreateVatRateDto } from './dto/create-vat-rate.dto.js';
import type { UpdateBillingTermsDto } from './dto/update-billing-terms.dto.js';
import type { UpdateLabourRateDto } from './dto/update-labour-rate.dto.js';
import type { UpdateVatRateDto } from './dto/update-vat-rate.dto.js';
import { LabourRate } from './entities/labour-rate.entity.js';
import { VatRate } from './entities/vat-rate.entity.js';
import { activeVatRate, loadRateBook } from './rate-book.js';

const termsOf = (o: Organisation): BillingTerms => ({
  vatNumber: o.vatNumber,
  paymentTermsDays: o.paymentTermsDays,
  quoteValidDays: o.quoteValidDays,
  paymentTerms: o.paymentTerms,
  paymentInstructions: o.paymentInstructions,
});

const nothingToChange = () => new BadRequestException('Nothing to change: send at least one field.');

/** The organisation's VAT rates, labour rates and default terms: data the office keeps, not code. */
@Injectable()
export class RatesService {
  constructor(private readonly queue: WriteQueue) {}

  async vatRates(user: AuthUser): Promise<{ items: VatRate[] }> {
    const book = await this.queue.read((em) => loadRateBook(em, user.organisationId));
    return { items: [...book.vat.values()] };
  }

  createVatRate(user: AuthUser, dto: CreateVatRateDto): Promise<VatRate> {
    return this.queue.run(async (em) => {
      if (await em.findOneBy(VatRate, { organisationId: user.organisationId, code: dto.code })) {
        throw new ConflictException(`code: there is already a VAT rate called ${dto.code}; change its rate instead.`);
      }
      return em.save(em.create(VatRate, { ...dto, organisationId: user.organisationId, active: true }));
    });
  }

  updateVatRate(user: AuthUser, id: string, dto: UpdateVatRateDto): Promise<VatRate> {
    const changes = definedFields(dto);
    if (!Object.keys(changes).length) throw nothingToChange();
    refuseEmptied(changes, ['name', 'basisPoints', 'active']);
    return this.queue.run(async (em) => {
      const rate = await em.findOneBy(VatRate, { id, organisationId: user.organisationId });
      if (!rate) throw new NotFoundException('No such VAT rate.');
      return em.save(Object.assign(rate, changes));
    });
  }

  async labourRates(user: AuthUser): Promise<{ items: LabourRate[] }> {
    const book = await this.queue.read((em) => loadRateBook(em, user.organisationId));
    return { items: book.labour };
  }

  createLabourRate(user: AuthUser, dto: CreateLabourRateDto): Promise<LabourRate> {
    return this.queue.run(async (em) => {
      activeVatRate(await loadRateBook(em, user.organisationId), dto.vatRateCode);
      const rate = await em.save(em.create(LabourRate, { ...dto, isDefault: dto.isDefault ?? false, organisationId: user.organisationId, active: true }));
      if (rate.isDefault) await this.onlyDefault(em, rate);
      return rate;
    });
  }

  updateLabourRate(user: AuthUser, id: string, dto: UpdateLabourRateDto): Promise<LabourRate> {
    const changes = definedFields(dto);
    if (!Object.keys(changes).length) throw nothingToChange();
    refuseEmptied(changes, ['name', 'hourlyMinor', 'vatRateCode', 'isDefault', 'active']);
    return this.queue.run(async (em) => {
      const rate = await em.findOneBy(LabourRate, { id, organisationId: user.organisationId });
      if (!rate) throw new NotFoundException('No such labour rate.');
      if (changes.vatRateCode) activeVatRate(await loadRateBook(em, user.organisationId), changes.vatRateCode);
      const saved = await em.save(Object.assign(rate, changes));
      if (saved.isDefault) await this.onlyDefault(em, saved);
      return saved;
    });
  }

  async terms(user: AuthUser): Promise<BillingTerms> {
    return termsOf(await this.queue.read((em) => em.findOneByOrFail(Organisation, { id: user.organisationId })));
  }

  updateTerms(user: AuthUser, dto: UpdateBillingTermsDto): Promise<BillingTerms> {
    const changes = definedFields(dto);
    if (!Object.keys(changes).length) throw nothingToChange();
    refuseEmptied(changes, ['paymentTermsDays', 'quoteValidDays']);
    return this.queue.run(async (em) => {
      // Only these columns: an UPDATE, never a rebuilt row.
      await em.update(Organisation, { id: user.organisationId }, changes);
      return termsOf(await em.findOneByOrFail(Organisation, { id: user.organisationId }));
    });
  }

  /** One default labour rate per organisation: making one the default stops the others being it. */
  private async onlyDefault(em: EntityManager, rate: LabourRate): Promise<void> {
    const others = await em.find(LabourRate, { where: { organisationId: rate.organisationId, isDefault: true } });
    for (const other of others.filter((o) => o.id !== rate.id)) await em.update(LabourRate, { id: other.id }, { isDefault: false });
  }
}
