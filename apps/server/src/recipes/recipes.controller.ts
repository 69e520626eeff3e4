import {
  copyRecipeSchema,
  type PlanAnswer,
  planQuerySchema,
  type PlanQuery,
  type RecipeData,
  recipeInputSchema,
  type RecipeSaveNotice,
  type RecipeView,
} from '@jarday/contracts';
import { Body, Controller, Delete, Get, HttpCode, Param, Post, Put, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { z } from 'zod';
import { type AuthUser, CurrentUser } from '../auth/auth.decorators.js';
import { ApiZodBody } from '../common/openapi.js';
import { AnyMember, KitchenRoles } from '../kitchens/kitchen-role.guard.js';
import { RecipesService } from './recipes.service.js';

const recipeIdSchema = z.string().min(1).max(64);

@ApiTags('recipes')
@ApiBearerAuth()
@Controller()
export class RecipesController {
  constructor(private readonly recipes: RecipesService) {}

  @Get('recipes/starters')
  starters(): readonly RecipeView[] {
    return this.recipes.starters();
  }

  @Get('recipes/starters/:starterId')
  starter(@Param('starterId', { schema: recipeIdSchema }) id: string): RecipeView {
    return this.recipes.starter(id);
  }

  @Get('kitchens/:kitchenId/recipes')
  @AnyMember()
  list(@Param('kitchenId') kitchenId: string): RecipeView[] {
    return this.recipes.list(kitchenId);
  }

  @Post('kitchens/:kitchenId/recipes')
  @KitchenRoles('lead')
  @ApiZodBody(recipeInputSchema)
  create(
    @Param('kitchenId') kitchenId: string,
    @CurrentUser() user: AuthUser,
    @Body({ schema: recipeInputSchema }) body: RecipeData,
  ): RecipeView {
    return this.recipes.create(kitchenId, user.id, body);
  }

  @Post('kitchens/:kitchenId/recipes/copy')
  @KitchenRoles('lead')
  @ApiZodBody(copyRecipeSchema)
  copy(
    @Param('kitchenId') kitchenId: string,
    @CurrentUser() user: AuthUser,
    @Body({ schema: copyRecipeSchema }) body: { recipeId: string },
  ): RecipeView {
    return this.recipes.copy(kitchenId, user.id, body.recipeId);
  }

  @Get('kitchens/:kitchenId/recipes/:recipeId')
  @AnyMember()
  get(@Param('kitchenId') kitchenId: string, @Param('recipeId', { schema: recipeIdSchema }) id: string): RecipeView {
    return this.recipes.get(kitchenId, id);
  }

  @Put('kitchens/:kitchenId/recipes/:recipeId')
  @KitchenRoles('lead')
  @ApiZodBody(recipeInputSchema)
  replace(
    @Param('kitchenId') kitchenId: string,
    @Param('recipeId', { schema: recipeIdSchema }) id: string,
    @Body({ schema: recipeInputSchema }) body: RecipeData,
  ): { recipe: RecipeView; notice: RecipeSaveNotice } {
    return this.recipes.replace(kitchenId, id, body);
  }

  @Delete('kitchens/:kitchenId/recipes/:recipeId')
  @KitchenRoles('lead')
  @HttpCode(204)
  remove(@Param('kitchenId') kitchenId: string, @Param('recipeId', { schema: recipeIdSchema }) id: string): void {
    this.recipes.remove(kitchenId, id);
  }

  @Get('kitchens/:kitchenId/recipes/:recipeId/plan')
  @AnyMember()
  plan(
    @Param('kitchenId') kitchenId: string,
    @Param('recipeId', { schema: recipeIdSchema }) id: string,
    @Query({ schema: planQuerySchema }) query: PlanQuery,
  ): PlanAnswer {
    return this.recipes.plan(kitchenId, id, query);
  }
}
