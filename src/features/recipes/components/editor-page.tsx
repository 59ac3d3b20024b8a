import { useNavigate, useParams } from 'react-router-dom';
import type { CreateRecipeInput } from '../../../../shared/schemas/recipes';
import { Caution, EmptyState, ErrorState, LinkButton, Loading, PageHeader } from '../../../components/ui';
import { useCurrentUser, useCan } from '../../../lib/current-user';
import { ApiError } from '../../../lib/api-client';
import { useToast } from '../../../components/ui';
import { useEquipment } from '../../../lib/equipment';
import { useIngredients } from '../../../lib/ingredients';
import { useVersion } from '../api/get-version';
import { useRecipe } from '../api/get-recipe';
import { useCreateRecipe, useSaveVersion, useUpdateRecipe } from '../api/save-recipe';
import { RecipeEditor } from './recipe-editor';
import { NEW_RECIPE } from './new-recipe';

const failure = (error: unknown) =>
  error instanceof ApiError
    ? { fieldErrors: error.fields, message: error.message }
    : { message: 'Something went wrong. Nothing was lost: try again.' };

/** Opens a version in the editor. A version a batch has used is frozen: saving it makes the next version. */
export function EditorPage() {
  const recipeId = Number(useParams().recipeId);
  const versionId = Number(useParams().versionId);
  const me = useCurrentUser();
  const canEdit = useCan('recipe.edit');
  const navigate = useNavigate();
  const toast = useToast();
  const version = useVersion(recipeId, versionId);
  const recipe = useRecipe(recipeId);
  const equipment = useEquipment();
  const library = useIngredients();
  const save = useSaveVersion();
  const updateRecipe = useUpdateRecipe();

  if (version.isPending || equipment.isPending || recipe.isPending) return <Loading label="Opening the recipe" />;
  if (version.isError) return <ErrorState error={version.error} onRetry={() => version.refetch()} />;
  if (equipment.isError) return <ErrorState error={equipment.error} onRetry={() => equipment.refetch()} />;
  if (recipe.isError) return <ErrorState error={recipe.error} onRetry={() => recipe.refetch()} />;
  const { recipe: r, version: v } = version.data;
  const next = recipe.data.versions[0]!.number + 1;
  const frozen = Boolean(v.frozenAt);

  const onSave = async (values: CreateRecipeInput, asNew: boolean) => {
    const { name, style, description, status, changeNote, equipmentProfileId, content } = values;
    try {
      if (name !== r.name || style !== r.style || description !== r.description || status !== r.status) {
        await updateRecipe.mutateAsync({ recipeId, name, style, description, status });
      }
      const saved = await save.mutateAsync({
        recipeId,
        versionId,
        asNew: asNew || frozen,
        input: { changeNote, equipmentProfileId, content },
      });
      toast(`Saved version ${saved.number}`);
      if (saved.id !== versionId) void navigate(`/recipes/${recipeId}/versions/${saved.id}`);
    } catch (error) {
      return failure(error);
    }
  };

  return (
    <>
      <PageHeader
        title={`${r.name} · version ${v.number}`}
        subtitle={`${v.changeNote} — ${v.authorName}, ${new Date(v.createdAt).toLocaleDateString()}`}
        actions={
          <>
            <LinkButton variant="quiet" className="underline" to={`/recipes/${recipeId}`}>
              All versions
            </LinkButton>
            <LinkButton variant="quiet" className="underline" to={`/recipes/${recipeId}/versions/${versionId}/scale`}>
              Scale
            </LinkButton>
            <LinkButton
              variant="quiet"
              className="underline"
              to={`/recipes/${recipeId}/versions/${versionId}/brew-sheet`}
            >
              Brew sheet
            </LinkButton>
          </>
        }
      />
      <RecipeEditor
        key={v.id}
        initial={{
          name: r.name,
          style: r.style,
          description: r.description,
          status: r.status,
          changeNote: frozen ? '' : v.changeNote,
          equipmentProfileId: v.equipmentProfileId,
          content: v.content,
        }}
        equipment={equipment.data}
        library={library.data ?? []}
        system={me.brewery.unitSystem}
        canEdit={canEdit}
        notice={
          frozen ? (
            <Caution title="This version has been brewed">
              A batch used it, so it stays as it was. Saving makes version {next}.
            </Caution>
          ) : undefined
        }
        saveLabel={frozen ? `Save as version ${next}` : `Save version ${v.number}`}
        saveAsNewLabel={frozen ? undefined : `Save as version ${next}`}
        onSave={onSave}
      />
    </>
  );
}

export function NewRecipePage() {
  const me = useCurrentUser();
  const canEdit = useCan('recipe.edit');
  const navigate = useNavigate();
  const equipment = useEquipment();
  const library = useIngredients();
  const create = useCreateRecipe();
  if (equipment.isPending) return <Loading label="Loading equipment" />;
  if (equipment.isError) return <ErrorState error={equipment.error} onRetry={() => equipment.refetch()} />;
  const first = equipment.data[0];
  if (!first) {
    return (
      <EmptyState
        title="Add your brewhouse first"
        action={
          <LinkButton variant="primary" to="/library">
            Add equipment
          </LinkButton>
        }
      >
        A recipe is written for a brewhouse: its efficiency and losses turn the recipe into weights and volumes.
      </EmptyState>
    );
  }
  return (
    <>
      <PageHeader title="New recipe" />
      <RecipeEditor
        initial={{
          ...NEW_RECIPE,
          equipmentProfileId: first.id,
          content: {
            ...NEW_RECIPE.content,
            targets: { ...NEW_RECIPE.content.targets, batchVolumeL: first.batchVolumeL },
          },
        }}
        equipment={equipment.data}
        library={library.data ?? []}
        system={me.brewery.unitSystem}
        canEdit={canEdit}
        saveLabel="Create recipe"
        onSave={async (values) => {
          try {
            const created = await create.mutateAsync(values);
            void navigate(`/recipes/${created.id}/versions/${created.versionId}`);
          } catch (error) {
            return failure(error);
          }
        }}
      />
    </>
  );
}
