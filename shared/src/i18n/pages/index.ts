import { shellEn, shellDe } from './shell.js';
import { authEn, authDe } from './auth.js';
import { settingsEn, settingsDe } from './settings.js';
import { dashboardEn, dashboardDe } from './dashboard.js';
import { notificationsEn, notificationsDe } from './notifications.js';
import { invitationsEn, invitationsDe } from './invitations.js';
import { exportDataEn, exportDataDe } from './exportData.js';
import { sacsEn, sacsDe } from './sacs.js';
import { projectsEn, projectsDe } from './projects.js';
import { accountEn, accountDe } from './account.js';
import { collectionEn, collectionDe } from './collection.js';
import { speciesEn, speciesDe } from './species.js';
import { progressEn, progressDe } from './progress.js';
import { failureNoticeEn, failureNoticeDe } from './failureNotice.js';

/** Text of the pages, one section per area of the client; each area keeps English and German side by side. */
export const pagesEn = {
  shell: shellEn,
  auth: authEn,
  settings: settingsEn,
  dashboard: dashboardEn,
  notifications: notificationsEn,
  invitations: invitationsEn,
  exportData: exportDataEn,
  sacs: sacsEn,
  projects: projectsEn,
  account: accountEn,
  collection: collectionEn,
  species: speciesEn,
  progress: progressEn,
  failureNotice: failureNoticeEn,
} as const;

export const pagesDe = {
  shell: shellDe,
  auth: authDe,
  settings: settingsDe,
  dashboard: dashboardDe,
  notifications: notificationsDe,
  invitations: invitationsDe,
  exportData: exportDataDe,
  sacs: sacsDe,
  projects: projectsDe,
  account: accountDe,
  collection: collectionDe,
  species: speciesDe,
  progress: progressDe,
  failureNotice: failureNoticeDe,
};
