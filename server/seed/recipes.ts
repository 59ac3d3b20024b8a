// Seeds the demo brewery's equipment and recipes (data in recipe-data.ts); its ingredient library comes with the brewery.
import { computeRecipe } from '../../shared/brewing';
import { equipmentAtVolume, toRecipeInput, type EquipmentInput } from '../../shared/schemas/recipes';
import { EquipmentProfile, Recipe, RecipeVersion } from '../models';
import type { DemoContext } from './context';
import { DEMO_EQUIPMENT, DEMO_RECIPES } from './recipe-data';

export async function seedRecipes({ brewery, users, transaction }: DemoContext): Promise<void> {
  const equipment = {} as Record<keyof typeof DEMO_EQUIPMENT, EquipmentProfile>;
  for (const [key, profile] of Object.entries(DEMO_EQUIPMENT) as [keyof typeof DEMO_EQUIPMENT, EquipmentInput][]) {
    equipment[key] = await EquipmentProfile.create({ breweryId: brewery.id, ...profile }, { transaction });
  }
  for (const demo of DEMO_RECIPES) {
    const recipe = await Recipe.create(
      { breweryId: brewery.id, name: demo.name, style: demo.style, description: demo.description, status: demo.status },
      { transaction },
    );
    const profile = DEMO_EQUIPMENT[demo.equipment];
    let number = 0;
    for (const v of demo.versions) {
      const c = computeRecipe(
        toRecipeInput(demo.name, v.content),
        equipmentAtVolume(profile, v.content.targets.batchVolumeL),
      );
      await RecipeVersion.create(
        {
          breweryId: brewery.id,
          recipeId: recipe.id,
          number: ++number,
          changeNote: v.changeNote,
          authorId: users.head_brewer.id,
          equipmentProfileId: equipment[demo.equipment].id,
          content: v.content,
          batchVolumeL: v.content.targets.batchVolumeL,
          og: c.og,
          fg: c.fg,
          ibu: c.ibu,
          srm: c.srm,
          abvPct: c.abvPct,
          frozenAt: null,
        },
        { transaction },
      );
    }
  }
}
