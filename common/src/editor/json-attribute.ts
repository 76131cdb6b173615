/**
 * A node attribute holding JSON (a recipe), kept in HTML as `data-<name>`.
 * Unreadable JSON in pasted HTML becomes null rather than breaking the paste.
 */
export function jsonAttribute(dataName: string, key: string) {
  return {
    default: null,
    parseHTML: (el: { getAttribute(name: string): string | null }) => {
      try {
        return JSON.parse(el.getAttribute(dataName) ?? 'null');
      } catch {
        return null;
      }
    },
    renderHTML: (a: Record<string, unknown>) => ({ [dataName]: JSON.stringify(a[key]) }),
  };
}
