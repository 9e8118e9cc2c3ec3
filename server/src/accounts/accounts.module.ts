import { Module, type OnModuleInit } from '@nestjs/common';
import { MikroOrmModule } from '@mikro-orm/nestjs';
import { ActivityModule } from '../activity/activity.module';
import { MailModule } from '../mail/mail.module';
import { ProjectsModule } from '../projects/projects.module';
import { ProjectFactsRegistry } from '../projects/project-facts.registry';
import { Project } from '../projects/project.entity';
import { ProjectAccount } from './project-account.entity';
import { LedgerEntryRow } from './ledger-entry.entity';
import { ShareBasis } from './share-basis.entity';
import { AccountLock } from './account-lock';
import { SharesService } from './shares.service';
import { BalancesService } from './balances.service';
import { EntriesService } from './entries.service';
import { SharesController } from './shares.controller';
import { BalancesController } from './balances.controller';
import { EntriesController } from './entries.controller';
import { StatementsController } from './statements.controller';
import { StatementsService } from './statements.service';
import { loadAccountFacts } from './account-loader';
import { isSettled } from './balances.mapper';
import { projectsWithBrood } from './projects-with-brood';

@Module({
  imports: [MikroOrmModule.forFeature([ProjectAccount, LedgerEntryRow, ShareBasis]), ProjectsModule, ActivityModule, MailModule],
  controllers: [SharesController, BalancesController, EntriesController, StatementsController],
  providers: [AccountLock, SharesService, BalancesService, EntriesService, StatementsService],
  exports: [AccountLock, EntriesService, BalancesService, SharesService],
})
export class AccountsModule implements OnModuleInit {
  constructor(private readonly facts: ProjectFactsRegistry) {}

  onModuleInit(): void {
    // Stage `shares-settled`: nothing owed in young or money (see balances.mapper isSettled).
    this.facts.register('sharesSettled', async (em, projectIds) => {
      const withBrood = [...(await projectsWithBrood(em, projectIds))];
      const accounts = await loadAccountFacts(em, withBrood.length ? await em.find(Project, { id: { $in: withBrood } }) : []);
      return new Map([...accounts].map(([id, view]) => [id, { sharesSettled: isSettled(view) }]));
    });
  }
}
