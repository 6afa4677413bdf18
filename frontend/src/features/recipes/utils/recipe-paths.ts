export const recipeVersionPath = (recipeId: number, versionId: number) => `/recipes/${recipeId}/versions/${versionId}`;
