import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import type { BalancesResponse, HandOverFormResponse } from '@broodsilk/shared';
import { HAND_OVER_METHODS } from '@broodsilk/shared';
import type { ProjectAccess } from '../projects/project-access.service';
import { loadAccount } from './account-loader';
import { toBalancesResponse } from './balances.mapper';

@Injectable()
export class BalancesService {
  constructor(private readonly em: EntityManager) {}

  async balances(access: ProjectAccess): Promise<BalancesResponse> {
    return toBalancesResponse(await loadAccount(this.em, access.project));
  }

  async handOverForm(access: ProjectAccess): Promise<HandOverFormResponse> {
    const view = await loadAccount(this.em, access.project);
    const terms = view.data.terms;
    return {
      parties: view.balances.parties.map((p) => ({ memberId: p.partyId, name: view.nameOf(p.partyId), owedSpiderlings: p.owedSpiderlings })),
      methods: HAND_OVER_METHODS,
      handOverStage: terms?.handOverStage ?? null,
      shippingPaidBy: terms?.shippingPaidBy ?? null,
    };
  }
}
