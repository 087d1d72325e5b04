#!/usr/bin/env python3
"""The libraries' one-way dependencies, checked on the sources: core <- render <- ui <- app.

core/ includes no Qt header and nothing from render/, ui/ or app/; render/ includes
nothing from ui/ or app/ and no Qt Widgets header (it draws headless); ui/ includes
nothing from app/. Every project include names its library and folder from the top
of the tree ("core/solver/step_solver.h"), so a wrong-way include is visible by its
first word.
    check_layout.py SOURCE_DIR QT_WIDGETS_INCLUDE_DIR
"""
import os
import re
import sys

source, widgets_dir = sys.argv[1], sys.argv[2]
widget_headers = set(os.listdir(widgets_dir)) if os.path.isdir(widgets_dir) else set()
include = re.compile(r'^\s*#\s*include\s*([<"])([^>"]+)[>"]', re.M)
forbidden = {
    'core': lambda q, name: q == '<' and name.startswith('Q') or name.split('/')[0] in ('render', 'ui', 'app'),
    'render': lambda q, name: name.split('/')[0] in ('ui', 'app') or name.startswith('QtWidgets')
                              or (q == '<' and name in widget_headers),
    'ui': lambda q, name: name.split('/')[0] == 'app',
}
problems = []
for library, rule in forbidden.items():
    for folder, _, files in os.walk(os.path.join(source, library)):
        for f in files:
            if not f.endswith(('.h', '.cpp')):
                continue
            path = os.path.join(folder, f)
            text = open(path, encoding='utf-8').read()
            for m in include.finditer(text):
                if rule(m.group(1), m.group(2)):
                    line = text.count('\n', 0, m.start()) + 1
                    problems.append(f'{os.path.relpath(path, source)}:{line}: {library}/ may not include {m.group(2)}')
if not widget_headers:
    problems.append(f'no Qt Widgets headers found in {widgets_dir}: cannot check render/')
for p in problems:
    print(p)
print(f'{0 if problems else 1} passed, {1 if problems else 0} failed')
sys.exit(1 if problems else 0)
