/** Download links for the printable recipe card in each paper size. */
export function CardLinks({ recipeId }: { recipeId: string }) {
  const sizes = [
    ["a6", "A6"],
    ["a5", "A5"],
    ["letter", "Letter"],
  ] as const;
  return (
    <div className="flex flex-wrap items-center gap-2 text-sm">
      <span className="text-iron-500">Recipe card (PDF):</span>
      {sizes.map(([size, label]) => (
        <a key={size} href={`/api/recipes/${recipeId}/card?size=${size}`} className="btn-quiet px-3 py-1.5" data-testid={`recipe-card-${size}`} download>
          {label}
        </a>
      ))}
    </div>
  );
}
