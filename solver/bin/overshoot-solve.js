#!/usr/bin/env node
// Launcher for the built CLI. It is committed (dist/ is not) so that npm links the bin on a fresh
// install; npm skips bins whose file does not exist at install time.
import '../dist/cli/main.js';
