/** Small readers for process.env, used only by the registerAs factories in this folder. */
export function envString(name: string, fallback: string): string {
  const value = process.env[name];
  return value === undefined || value === '' ? fallback : value;
}

export function envInt(name: string, fallback: number): number {
  const value = process.env[name];
  return value === undefined || value === '' ? fallback : Number.parseInt(value, 10);
}

export function envBool(name: string, fallback: boolean): boolean {
  const value = process.env[name];
  return value === undefined || value === '' ? fallback : value === 'true';
}
