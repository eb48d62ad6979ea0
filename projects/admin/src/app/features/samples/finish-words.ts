/** A finish system as the sample form offers it: "Limewash (1 layer)", "Polished lime (3 layers)" — a key of the samples words and its params. */
export function finishChoiceWords(name: string, layerCount: number): { key: string; params: { name: string; count: number } } {
  return {
    key: layerCount === 1 ? 'samples.newBoard.finishChoiceOne' : 'samples.newBoard.finishChoiceMany',
    params: { name, count: layerCount },
  };
}
