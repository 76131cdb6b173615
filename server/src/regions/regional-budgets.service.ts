import { EntityManager } from '@mikro-orm/sqlite';
import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import { PGC_PER_MOL, PGC_PER_YEAR_PER_MOL_PER_SECOND, regionalBudget, type RegionalBudgetBody, type RegionalBudgetResponse } from '@upwell/common';
import { GroupPolicy } from '../groups/group.policy';
import { Series } from '../series/series.entity';
import { SeriesService, type AddedVersion } from '../series/series.service';
import type { User } from '../users/user.entity';
import { computeNativeBudget } from './native-grid/native-budget';
import { regionMasksOnGrid } from './region-masks';
import { RegionSet, RegionSetVersion } from './region-set.entity';
import { UploadedNetcdf } from './uploaded-netcdf';

const depthLabel = (h: number | null) => (h === null ? 'full depth' : `0–${h} m`);

/** Regional budgets from gridded budget terms on a model's native grid, stored as derived series. */
@Injectable()
export class RegionalBudgetsService {
  constructor(
    private readonly em: EntityManager,
    private readonly groups: GroupPolicy,
    private readonly uploads: UploadedNetcdf,
    private readonly series: SeriesService,
  ) {}

  async compute(user: User, groupId: string, body: RegionalBudgetBody): Promise<RegionalBudgetResponse> {
    const membership = await this.groups.authorize(user, groupId, 'upload-series');
    const upload = await this.uploads.find(groupId, body.uploadId);
    const set = await this.em.findOne(RegionSet, { id: body.regionSetId, group: groupId });
    if (!set) throw new NotFoundException('no such region set in this group');
    const number = body.regionSetVersion ?? set.latestVersion;
    const version = await this.em.findOne(RegionSetVersion, { regionSet: set, number }, { populate: ['codes'] });
    if (!version) throw new BadRequestException(`region set "${set.name}" has no version ${number}`);

    // Everything is read and checked before anything is stored.
    const budget = await this.uploads.with(upload, (file) => computeNativeBudget(file, body, (grid) => regionMasksOnGrid(version, set.name, grid)));
    const perYear = body.units === 'Pg C/yr';
    const rateFactor = perYear ? PGC_PER_YEAR_PER_MOL_PER_SECOND : 1;
    const rateUnits = perYear ? 'Pg C/yr' : 'mol/s';
    const variables = [...body.terms.map((t) => t.variable), ...(body.inventoryVariable ? [body.inventoryVariable] : [])];
    const outputs: { name: string; kind: 'budget-term' | 'carbon-inventory'; units: string; region: string; depth: string; quantity: string; values: number[]; description: string }[] = [];
    const closure: RegionalBudgetResponse['closure'] = [];
    for (const cell of budget.cells) {
      const depth = depthLabel(cell.depthLimit);
      const b = regionalBudget(cell.terms);
      closure.push({ region: cell.region, depth, relativeClosure: b.relativeClosure });
      const base = `${cell.region}, ${depth}: integrated over the region's cells with ${budget.grid.areaVariable} and ${budget.thicknessSource}, from ${upload.originalName} (sha256 ${upload.sha256.slice(0, 12)}), region set "${set.name}" v${version.number}`;
      const toRate = (v: Float64Array) => Array.from(v, (x) => x * rateFactor);
      outputs.push({ name: `${body.namePrefix} · ${cell.region} · ${depth} · tendency`, kind: 'budget-term', units: rateUnits, region: cell.region, depth, quantity: 'tendency', values: toRate(b.tendency), description: `tendency (${budget.tendencyVariable}); ${base}` });
      for (const t of b.terms) {
        outputs.push({ name: `${body.namePrefix} · ${cell.region} · ${depth} · ${t.role} (${t.name})`, kind: 'budget-term', units: rateUnits, region: cell.region, depth, quantity: t.role, values: toRate(t.values), description: `${t.role} (${t.name}, sign ${body.terms.find((x) => x.variable === t.name)!.sign > 0 ? '+' : '−'}: positive adds carbon); ${base}` });
      }
      outputs.push({ name: `${body.namePrefix} · ${cell.region} · ${depth} · residual`, kind: 'budget-term', units: rateUnits, region: cell.region, depth, quantity: 'residual', values: toRate(b.residual), description: `closure residual = tendency − Σ signed terms (max |residual| / max |tendency| = ${b.relativeClosure?.toExponential(2) ?? 'n/a'}); ${base}` });
      if (cell.inventory) {
        outputs.push({ name: `${body.namePrefix} · ${cell.region} · ${depth} · inventory`, kind: 'carbon-inventory', units: perYear ? 'Pg C' : 'mol', region: cell.region, depth, quantity: 'inventory', values: Array.from(cell.inventory, (x) => x * (perYear ? PGC_PER_MOL : 1)), description: `inventory (${body.inventoryVariable}); ${base}` });
      }
    }

    const added = await this.em.transactional(async (em) => {
      const results: { added: AddedVersion; out: (typeof outputs)[number] }[] = [];
      for (const out of outputs) {
        const transform = { type: 'regional-budget' as const, uploadId: upload.id, variables, regionSetId: set.id, regionSetVersion: version.number, region: out.region, depth: out.depth, description: out.description };
        const next = { start: budget.start, values: out.values.map((v) => (Number.isFinite(v) ? v : null)), file: upload, transform };
        const existing = await em.findOne(Series, { group: groupId, name: out.name }, { populate: ['group'] });
        const a = existing
          ? this.series.addVersion(em, existing, user, next, (await this.series.latestVersions([existing])).get(existing.id) ?? null)
          : this.series.createSeries(em, membership.group, user, { name: out.name, kind: out.kind, variable: out.quantity, units: out.units, region: out.region, depthLayer: out.depth, source: upload.originalName, origin: 'derived', notes: out.description }, next);
        results.push({ added: a, out });
      }
      if (!upload.importedAt) upload.importedAt = new Date();
      return results;
    });
    this.series.announce(added.map((r) => r.added), user);
    return {
      series: added.map(({ added: a, out }) => ({ id: a.series.id, name: a.series.name, version: a.version.number, created: a.created, region: out.region, depth: out.depth, quantity: out.quantity })),
      closure,
    };
  }
}
