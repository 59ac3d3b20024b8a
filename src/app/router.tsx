import { createBrowserRouter } from 'react-router-dom';
import { AppLayout } from './routes/app-layout';
import { NotFoundPage } from './routes/not-found';
import { RouteError } from './routes/route-error';
import type { PageAccess } from './navigation';

// Every page loads on demand, so the sign-in and taproom screens never download the recipe editor.
// Every signed-in page names the policy action it needs (handle.action, checked by AppLayout), as the API's routes do.
export const router = createBrowserRouter([
  {
    path: '/sign-in',
    lazy: () => import('../features/auth/components/sign-in-page').then((m) => ({ Component: m.SignInPage })),
  },
  {
    path: '/sign-up',
    lazy: () => import('../features/auth/components/sign-up-page').then((m) => ({ Component: m.SignUpPage })),
  },
  {
    path: '/join/:token',
    lazy: () =>
      import('../features/auth/components/accept-invite-page').then((m) => ({ Component: m.AcceptInvitePage })),
  },
  {
    path: '/forgot-password',
    lazy: () => import('../features/auth/components/reset-pages').then((m) => ({ Component: m.ForgotPasswordPage })),
  },
  {
    path: '/reset/:token',
    lazy: () => import('../features/auth/components/reset-pages').then((m) => ({ Component: m.ResetPasswordPage })),
  },
  {
    path: '/',
    Component: AppLayout,
    ErrorBoundary: RouteError,
    children: [
      {
        // A page that fails to open shows RouteError inside the signed-in shell, so the menu stays.
        ErrorBoundary: RouteError,
        children: [
          {
            index: true,
            handle: { action: 'account.read' } satisfies PageAccess,
            lazy: () => import('./routes/home-page').then((m) => ({ Component: m.HomePage })),
          },
          {
            path: 'team',
            handle: { action: 'team.manage' } satisfies PageAccess,
            lazy: () => import('../features/team/components/team-page').then((m) => ({ Component: m.TeamPage })),
          },
          {
            path: 'settings',
            handle: { action: 'brewery.read' } satisfies PageAccess,
            lazy: () =>
              import('../features/settings/components/settings-page').then((m) => ({ Component: m.SettingsPage })),
          },
          {
            path: 'recipes',
            handle: { action: 'recipe.read' } satisfies PageAccess,
            lazy: () =>
              import('../features/recipes/components/recipe-list-page').then((m) => ({ Component: m.RecipeListPage })),
          },
          {
            path: 'recipes/new',
            handle: { action: 'recipe.edit' } satisfies PageAccess,
            lazy: () =>
              import('../features/recipes/components/editor-page').then((m) => ({ Component: m.NewRecipePage })),
          },
          {
            path: 'recipes/:recipeId',
            handle: { action: 'recipe.read' } satisfies PageAccess,
            lazy: () => import('../features/recipes/components/recipe-page').then((m) => ({ Component: m.RecipePage })),
          },
          {
            path: 'recipes/:recipeId/compare',
            handle: { action: 'recipe.read' } satisfies PageAccess,
            lazy: () =>
              import('../features/recipes/components/compare-page').then((m) => ({ Component: m.ComparePage })),
          },
          {
            path: 'recipes/:recipeId/versions/:versionId',
            handle: { action: 'recipe.read' } satisfies PageAccess,
            lazy: () => import('../features/recipes/components/editor-page').then((m) => ({ Component: m.EditorPage })),
          },
          {
            path: 'recipes/:recipeId/versions/:versionId/scale',
            handle: { action: 'recipe.read' } satisfies PageAccess,
            lazy: () => import('../features/recipes/components/scale-page').then((m) => ({ Component: m.ScalePage })),
          },
          {
            path: 'recipes/:recipeId/versions/:versionId/brew-sheet',
            handle: { action: 'recipe.read' } satisfies PageAccess,
            lazy: () =>
              import('../features/recipes/components/brew-sheet-page').then((m) => ({ Component: m.BrewSheetPage })),
          },
          {
            path: 'library',
            handle: { action: 'equipment.read' } satisfies PageAccess,
            lazy: () =>
              import('../features/library/components/library-page').then((m) => ({ Component: m.LibraryPage })),
          },
          {
            path: 'batches',
            handle: { action: 'batch.read' } satisfies PageAccess,
            lazy: () =>
              import('../features/batches/components/batch-list-page').then((m) => ({ Component: m.BatchListPage })),
          },
          {
            path: 'batches/new',
            handle: { action: 'batch.plan' } satisfies PageAccess,
            lazy: () =>
              import('../features/batches/components/new-batch-page').then((m) => ({ Component: m.NewBatchPage })),
          },
          {
            path: 'batches/:batchId',
            handle: { action: 'batch.read' } satisfies PageAccess,
            lazy: () =>
              import('../features/batches/components/brew-day-page').then((m) => ({ Component: m.BrewDayPage })),
          },
          {
            path: 'batches/:batchId/label',
            handle: { action: 'batch.read' } satisfies PageAccess,
            lazy: () =>
              import('../features/batches/components/batch-label-page').then((m) => ({
                Component: m.BatchLabelPage,
              })),
          },
          {
            path: 'batches/:batchId/record',
            handle: { action: 'batch.read' } satisfies PageAccess,
            lazy: () =>
              import('../features/batches/components/batch-record-page').then((m) => ({
                Component: m.BatchRecordPage,
              })),
          },
          {
            path: 'cellar',
            handle: { action: 'cellar.read' } satisfies PageAccess,
            lazy: () =>
              import('../features/cellar/components/vessel-board-page').then((m) => ({ Component: m.VesselBoardPage })),
          },
          {
            path: 'cellar/vessels',
            handle: { action: 'vessel.read' } satisfies PageAccess,
            lazy: () =>
              import('../features/cellar/components/vessels-page').then((m) => ({ Component: m.VesselsPage })),
          },
          {
            path: 'cellar/vessels/labels',
            handle: { action: 'vessel.read' } satisfies PageAccess,
            lazy: () =>
              import('../features/cellar/components/vessel-labels-page').then((m) => ({
                Component: m.VesselLabelsPage,
              })),
          },
          {
            path: 'cellar/batches/:batchId',
            handle: { action: 'cellar.read' } satisfies PageAccess,
            lazy: () =>
              import('../features/cellar/components/batch-cellar-page').then((m) => ({ Component: m.BatchCellarPage })),
          },
          {
            path: 'taproom',
            handle: { action: 'taproom.read' } satisfies PageAccess,
            lazy: () =>
              import('../features/taproom/components/taproom-home').then((m) => ({ Component: m.TaproomHome })),
          },
          {
            path: 'taproom/board',
            handle: { action: 'taproom.read' } satisfies PageAccess,
            lazy: () =>
              import('../features/taproom/components/bar-board-page').then((m) => ({ Component: m.BarBoardPage })),
          },
          {
            path: 'taproom/beers/:beerId/briefing',
            handle: { action: 'taproom.read' } satisfies PageAccess,
            lazy: () =>
              import('../features/taproom/components/briefing-sheet-page').then((m) => ({
                Component: m.BriefingSheetPage,
              })),
          },
          {
            path: 'releases',
            handle: { action: 'release.read' } satisfies PageAccess,
            lazy: () =>
              import('../features/taproom/components/releases-page').then((m) => ({ Component: m.ReleasesPage })),
          },
          {
            path: 'batches/:batchId/release',
            handle: { action: 'release.read' } satisfies PageAccess,
            lazy: () =>
              import('../features/taproom/components/release-page').then((m) => ({ Component: m.ReleasePage })),
          },
          {
            path: 'batches/:batchId/tasting',
            handle: { action: 'tasting.read' } satisfies PageAccess,
            lazy: () =>
              import('../features/tasting/components/tasting-page').then((m) => ({ Component: m.TastingPage })),
          },
          {
            path: 'reports/production',
            handle: { action: 'report.production.read' } satisfies PageAccess,
            lazy: () =>
              import('../features/reports/components/production-page').then((m) => ({ Component: m.ProductionPage })),
          },
          {
            path: 'reports/history',
            handle: { action: 'report.history.read' } satisfies PageAccess,
            lazy: () =>
              import('../features/reports/components/history-page').then((m) => ({ Component: m.HistoryPage })),
          },
        ],
      },
    ],
  },
  { path: '*', Component: NotFoundPage },
]);
