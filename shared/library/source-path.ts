// Source paths join layer names with '/', escaping '\' and '/' inside names ('Wave \/ band').
// For people, show the names themselves, separated by a spaced slash.
export function sourcePathParts(path: string): string[] {
  const parts: string[] = [];
  let current = '';
  for (let i = 0; i < path.length; i++) {
    const ch = path[i];
    if (ch === '\\' && i + 1 < path.length) current += path[++i];
    else if (ch === '/') {
      parts.push(current);
      current = '';
    } else current += ch;
  }
  parts.push(current);
  return parts;
}

export const displaySourcePath = (path: string) => sourcePathParts(path).join(' / ');
