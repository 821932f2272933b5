#!/usr/bin/env python3
"""Writes public/fonts/material-symbols-subset.woff2: the Material Symbols Outlined font cut down to the
icons named in src/app/core/icon-names.ts (their ligature glyphs plus the letters that spell them), so the
browser downloads a few kilobytes instead of the whole 4 MB font. Needs fontTools (pip install fonttools brotli).
Run after adding an icon to icon-names.ts:  python3 scripts/icons/subset-icons.py"""
import re
import sys
from pathlib import Path
from fontTools import subset
from fontTools.ttLib import TTFont

root = Path(__file__).resolve().parents[2]
names = re.findall(r"'([a-z0-9_]+)'", (root / 'src/app/core/icon-names.ts').read_text().split('[', 1)[1].split(']', 1)[0])
font = TTFont(root / 'node_modules/material-symbols/material-symbols-outlined.woff2')
missing = [n for n in names if n not in font.getGlyphOrder()]
if missing:
    sys.exit(f'not in Material Symbols Outlined: {", ".join(missing)}')
options = subset.Options()
options.flavor = 'woff2'
options.layout_features = ['*']
options.layout_closure = False
options.notdef_outline = True
options.name_IDs = ['*']
subsetter = subset.Subsetter(options)
subsetter.populate(glyphs=names, text=''.join(sorted(set(''.join(names)))))
subsetter.subset(font)
out = root / 'public/fonts/material-symbols-subset.woff2'
out.parent.mkdir(parents=True, exist_ok=True)
font.flavor = 'woff2'
font.save(out)
print(f'{out.relative_to(root)}: {len(names)} icons, {out.stat().st_size} bytes')
