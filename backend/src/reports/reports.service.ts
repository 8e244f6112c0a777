import { BadRequestException, ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { EngineInputError } from '@thermbay/engine/errors';
import { Op } from 'sequelize';
import { ClimateService } from '../climate/climate.service';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { roleAllows, type Permission } from '../common/permissions';
import { EstimatesService } from '../estimates/estimates.service';
import { FarmAccessService } from '../farms/farm-access.service';
import { Farm } from '../farms/models/farm.model';
import { Membership } from '../farms/models/membership.model';
import { houseToDto } from '../houses/house.mapper';
import { HousesService } from '../houses/houses.service';
import { House } from '../houses/models/house.model';
import { MailService } from '../mail/mail.service';
import { SeasonService } from '../season/season.service';
import type { SideBySideColumnDto } from '../side-by-side/dto/side-by-side.dto';
import { SideBySideService } from '../side-by-side/side-by-side.service';
import { User } from '../users/models/user.model';
import { normaliseEmail, UsersService } from '../users/users.service';
import type {
  ClientFarmDto,
  CreateReportDto,
  ReportDto,
  ReportSentDto,
  ReportSummaryDto,
  SendReportDto,
  UpdateReportDto,
} from './dto/report.dto';
import { Report } from './models/report.model';
import { buildReportDocument, type ReportDocument } from './report-document';
import { renderReportPdf } from './report-pdf';
import type { ReportAlternativeColumn, ReportAlternatives, ReportSnapshot } from './report-snapshot';

function toSummary(row: Report): ReportSummaryDto {
  return {
    id: row.id,
    farmId: row.farmId,
    houseId: row.houseId,
    houseName: row.houseName,
    title: row.title,
    status: row.status,
    revision: row.revision,
    previousReportId: row.previousReportId,
    authorName: row.authorName,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    issuedAt: row.issuedAt ? row.issuedAt.toISOString() : null,
  };
}

function errorText(error: unknown): string {
  return typeof error === 'object' && error !== null && typeof (error as Error).message === 'string'
    ? (error as Error).message
    : 'the season could not be estimated';
}

/** A side-by-side column with only what a report keeps of it. */
function reportColumn(column: SideBySideColumnDto): ReportAlternativeColumn {
  return {
    key: column.key,
    alternativeId: column.alternativeId,
    name: column.name,
    changedFields: column.changedFields,
    ownCalendar: column.ownCalendar,
    costAmount: column.costAmount,
    invalid: column.invalid,
    versusHouse: column.versusHouse,
    heating: column.heating
      ? { heatLoss: column.heating.heatLoss, heater: column.heating.heater, cautions: column.heating.cautions }
      : null,
    cooling: column.cooling ? { capacity: column.cooling.capacity } : null,
    season: column.season
      ? {
          period: column.season.period,
          fuel: column.season.fuel,
          total: column.season.total,
          cautions: column.season.cautions,
        }
      : null,
  };
}

/** A file name safe everywhere: "north-house-heater-sizing-r2.pdf". */
export function reportFileName(report: Pick<Report, 'houseName' | 'title' | 'revision'>): string {
  const slug = `${report.houseName} ${report.title}`
    .normalize('NFKD')
    .replace(/[^\w\s-]/g, '')
    .trim()
    .toLowerCase()
    .replace(/[\s_-]+/g, '-')
    .slice(0, 80);
  return `${slug || 'report'}-r${report.revision}.pdf`;
}

@Injectable()
export class ReportsService {
  constructor(
    @InjectModel(Report) private readonly reports: typeof Report,
    @InjectModel(Farm) private readonly farms: typeof Farm,
    @InjectModel(Membership) private readonly memberships: typeof Membership,
    @InjectModel(House) private readonly houses: typeof House,
    private readonly access: FarmAccessService,
    private readonly housesService: HousesService,
    private readonly estimates: EstimatesService,
    private readonly season: SeasonService,
    private readonly sideBySide: SideBySideService,
    private readonly climate: ClimateService,
    private readonly users: UsersService,
    private readonly mail: MailService,
  ) {}

  /** Takes the snapshot: everything computed now, stored as it is. */
  async create(user: AuthenticatedUser, houseId: number, body: CreateReportDto): Promise<ReportDto> {
    const house = await this.housesService.loadFor(user, houseId, 'report:write');
    const snapshot = await this.takeSnapshot(user, house);
    const author = await this.users.findById(user.id);
    const row = await this.reports.create({
      farmId: house.farmId,
      houseId: house.id,
      houseName: house.name,
      title: body.title.trim(),
      notes: body.notes ?? '',
      recommendations: body.recommendations ?? '',
      status: 'draft',
      revision: 1,
      previousReportId: null,
      authorUserId: user.id,
      authorName: author.name,
      issuedAt: null,
      snapshot,
    });
    return this.toDto(user, row);
  }

  async listForHouse(user: AuthenticatedUser, houseId: number): Promise<ReportSummaryDto[]> {
    const house = await this.housesService.loadFor(user, houseId, 'house:read');
    const rows = await this.reports.findAll({ where: { houseId: house.id }, order: [['id', 'DESC']] });
    return rows.map(toSummary);
  }

  async listForFarm(user: AuthenticatedUser, farmId: number): Promise<ReportSummaryDto[]> {
    await this.access.require(user, farmId, 'farm:read');
    const rows = await this.reports.findAll({ where: { farmId }, order: [['id', 'DESC']] });
    return rows.map(toSummary);
  }

  async get(user: AuthenticatedUser, reportId: number): Promise<ReportDto> {
    return this.toDto(user, await this.loadFor(user, reportId, 'farm:read'));
  }

  async update(user: AuthenticatedUser, reportId: number, body: UpdateReportDto): Promise<ReportDto> {
    const row = await this.loadFor(user, reportId, 'report:write');
    if (row.status === 'issued') {
      throw new ConflictException('An issued report cannot be changed; start a new revision to revise it');
    }
    await row.update({
      ...(body.title !== undefined ? { title: body.title.trim() } : {}),
      ...(body.notes !== undefined ? { notes: body.notes } : {}),
      ...(body.recommendations !== undefined ? { recommendations: body.recommendations } : {}),
    });
    return this.toDto(user, row);
  }

  async issue(user: AuthenticatedUser, reportId: number): Promise<ReportDto> {
    const row = await this.loadFor(user, reportId, 'report:write');
    if (row.status === 'issued') throw new ConflictException('This report is issued already');
    await row.update({ status: 'issued', issuedAt: new Date() });
    return this.toDto(user, row);
  }

  /** A draft copy of the report (same snapshot and text) to revise. */
  async revise(user: AuthenticatedUser, reportId: number): Promise<ReportDto> {
    const row = await this.loadFor(user, reportId, 'report:write');
    const author = await this.users.findById(user.id);
    const latest = (await this.reports.max('revision', { where: this.revisionFamily(row) })) as number | null;
    const copy = await this.reports.create({
      farmId: row.farmId,
      houseId: row.houseId,
      houseName: row.houseName,
      title: row.title,
      notes: row.notes,
      recommendations: row.recommendations,
      status: 'draft',
      revision: (latest ?? row.revision) + 1,
      previousReportId: row.id,
      authorUserId: user.id,
      authorName: author.name,
      issuedAt: null,
      snapshot: row.snapshot,
    });
    return this.toDto(user, copy);
  }

  async pdf(user: AuthenticatedUser, reportId: number): Promise<{ fileName: string; content: Buffer }> {
    const row = await this.loadFor(user, reportId, 'farm:read');
    const document = this.documentOf(row, await this.unitSystemOf(user));
    return { fileName: reportFileName(row), content: await renderReportPdf(document) };
  }

  /** E-mails the PDF to chosen members and addresses; a failed send is reported and kept. */
  async send(user: AuthenticatedUser, reportId: number, body: SendReportDto): Promise<ReportSentDto> {
    const row = await this.loadFor(user, reportId, 'report:write');
    const recipients = new Set<string>();
    if (body.memberUserIds?.length) {
      const members = await this.memberships.findAll({
        where: { farmId: row.farmId, userId: { [Op.in]: body.memberUserIds } },
        include: [User],
      });
      if (members.length !== new Set(body.memberUserIds).size) {
        throw new BadRequestException('memberUserIds must name members of this farm');
      }
      for (const member of members) recipients.add(normaliseEmail(member.user.email));
    }
    for (const email of body.emails ?? []) recipients.add(normaliseEmail(email));
    if (recipients.size === 0) throw new BadRequestException('Choose at least one member or e-mail address');

    const sender = await this.users.findById(user.id);
    const document = this.documentOf(row, sender.unitSystem);
    const pdf = await renderReportPdf(document);
    const message = body.message?.trim();
    const to = [...recipients];
    const outcome = await this.mail.send({
      kind: 'report',
      senderUserId: user.id,
      to,
      subject: `${row.title} — ${document.farmName}`,
      text:
        (message ? `${message}\n\n` : '') +
        `${sender.name} (${sender.email}) sends you the report "${row.title}" for ${row.houseName} at ${document.farmName}, ` +
        `attached as a PDF.\n\n${document.footer}\n`,
      attachments: [{ fileName: reportFileName(row), contentType: 'application/pdf', content: pdf }],
    });
    return { ...outcome, recipients: to };
  }

  /** For an adviser's home: each farm where they advise, with its newest report. */
  async clientFarms(user: AuthenticatedUser): Promise<ClientFarmDto[]> {
    const memberships = await this.memberships.findAll({
      where: { userId: user.id, role: 'adviser' },
      include: [Farm],
      order: [[{ model: Farm, as: 'farm' }, 'name', 'ASC']],
    });
    return Promise.all(
      memberships.map(async (m) => {
        const latest = await this.reports.findOne({ where: { farmId: m.farmId }, order: [['id', 'DESC']] });
        return {
          farmId: m.farmId,
          farmName: m.farm.name,
          houseCount: await this.houses.count({ where: { farmId: m.farmId } }),
          latestReport: latest ? toSummary(latest) : null,
        };
      }),
    );
  }

  documentOf(row: Report, unitSystem: 'si' | 'us'): ReportDocument {
    return buildReportDocument(row.snapshot, row, unitSystem);
  }

  private revisionFamily(row: Report) {
    return { farmId: row.farmId, houseName: row.houseName, houseId: row.houseId };
  }

  private async unitSystemOf(user: AuthenticatedUser): Promise<'si' | 'us'> {
    return (await this.users.findById(user.id)).unitSystem;
  }

  private async takeSnapshot(user: AuthenticatedUser, house: House): Promise<ReportSnapshot> {
    const farm = await this.farms.findByPk(house.farmId);
    if (!farm) throw new NotFoundException('No such farm');
    const heating = await this.estimates.heatingForHouse(user, house.id, {});
    let season: ReportSnapshot['season'];
    try {
      const estimate = await this.season.season(user, house.id, {});
      season = {
        status: 'estimated',
        estimate: {
          period: estimate.period,
          fuel: estimate.fuel,
          total: estimate.total,
          heaterCapacity: estimate.heaterCapacity,
          assumptions: estimate.assumptions,
          cautions: estimate.cautions,
          inputsUsed: estimate.inputsUsed,
        },
      };
    } catch (error) {
      season = { status: 'not-available', reason: errorText(error) };
    }
    const alternatives = await this.alternativesOf(user, house);
    // JSON round trip: the snapshot is plain data, detached from any row or cache
    return JSON.parse(
      JSON.stringify({
        version: 1,
        takenAt: new Date().toISOString(),
        farm: {
          id: farm.id,
          name: farm.name,
          latitudeDeg: farm.latitudeDeg,
          longitudeDeg: farm.longitudeDeg,
          elevationM: farm.elevationM,
          timeZone: farm.timeZone,
          currency: farm.currency,
        },
        house: houseToDto(house),
        climate: await this.climate.findForFarm(house.farmId),
        heating,
        season,
        alternatives,
      } satisfies ReportSnapshot),
    ) as ReportSnapshot;
  }

  /**
   * The house beside its newest saved alternatives (as many as the side-by-side takes), through
   * the side-by-side itself with the same request a report's own estimates use (defaults only).
   * When the house's own column cannot be computed (no summer design conditions, say), the
   * section says why instead; any other error fails the report as it would the side-by-side.
   */
  private async alternativesOf(user: AuthenticatedUser, house: House): Promise<ReportAlternatives> {
    const { ids, savedCount } = await this.sideBySide.newestAlternativeIds(house);
    if (savedCount === 0) return { status: 'none' };
    try {
      const compared = await this.sideBySide.compareLoaded(user, house, { alternativeIds: ids });
      return {
        status: 'compared',
        savedCount,
        columns: compared.columns.map(reportColumn),
        heatingConditionsUsed: compared.heatingConditionsUsed,
        seasonInputsUsed: compared.seasonInputsUsed,
      };
    } catch (error) {
      if (!(error instanceof EngineInputError)) throw error;
      return { status: 'not-available', savedCount, reason: error.message };
    }
  }

  private async loadFor(user: AuthenticatedUser, reportId: number, permission: Permission): Promise<Report> {
    const row = await this.reports.findByPk(reportId);
    if (!row) throw new NotFoundException('No such report');
    try {
      await this.access.require(user, row.farmId, permission);
    } catch (error) {
      if (error instanceof NotFoundException) throw new NotFoundException('No such report');
      throw error;
    }
    return row;
  }

  private async toDto(user: AuthenticatedUser, row: Report): Promise<ReportDto> {
    const membership = await this.memberships.findOne({ where: { farmId: row.farmId, userId: user.id } });
    return {
      ...toSummary(row),
      notes: row.notes,
      recommendations: row.recommendations,
      canWrite: membership ? roleAllows(membership.role, 'report:write') : false,
      document: this.documentOf(row, await this.unitSystemOf(user)),
      snapshot: row.snapshot as unknown as Record<string, unknown>,
    };
  }
}
