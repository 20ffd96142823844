import { describe, expect, it } from 'vitest';
import { startLine, viteArgs } from '../../scripts/start-args.mjs';

describe('npm start with port 5173 taken', () => {
  it('asks vite for 5173 without --strictPort, so a taken port moves on to the next free one', () => {
    const args = viteArgs([]) as string[];
    expect(args).toEqual(['--port', '5173']);
    expect(args).not.toContain('--strictPort');
  });
  it('takes the port the user chose (`npm start -- --port 8080`) and adds none of its own', () => {
    expect(viteArgs(['--port', '8080'])).toEqual(['--port', '8080']);
    expect(viteArgs(['--port=8080', '--host'])).toEqual(['--port=8080', '--host']);
  });
  it('says plainly how to choose a port', () => {
    expect(startLine([])).toContain('npm start -- --port N');
    expect(startLine([])).toContain('next free port');
  });
});
