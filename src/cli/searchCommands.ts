import type { Command } from 'commander';
import type { Io } from './io.js';

export function registerSearchCommands(_program: Command, _io: Io, _setCode: (c: number) => void): void {}
