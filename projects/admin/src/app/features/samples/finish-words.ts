/** A finish system as the sample form offers it: "Limewash (1 layer)", "Polished lime (3 layers)". */
export function finishChoiceText(name: string, layerCount: number): string {
  return `${name} (${layerCount} ${layerCount === 1 ? 'layer' : 'layers'})`;
}
