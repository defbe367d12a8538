"""The name-list feature: which open name lists hold a word. Built at training time from the
lists the project already ships (models/lexicon, see models/namelists.md) and the GeoNames cities
in ../shared/data, written next to the model as ner.lexicon.tsv.gz and read back by
src/SwitchTag.Tagging/NameLexicon.cs, so training and inference look words up in the same table.

Flags per lower-cased single word (features.lower), in this order:
  F  a first name (faker first-name lists)      S  a surname (faker surname lists)
  P  a city or town (GeoNames cities15000 names, ASCII names and alternate names; camps and ghettos)
  R  a country, territory, first-level or historical region (CLDR territories, iso-codes regions)
  N  a language, nationality or people name (CLDR language names, nationality adjectives, peoples)
Only single-word names count: the tagger sees one word at a time, and a word of a multi-word name
("New" of New York) says little on its own."""
import glob
import gzip
import os

import features as fx

FLAGS = "FSPRN"


def _names(path, column, split_bar=False):
    with open(path, encoding="utf-8") as fh:
        for line in fh:
            if line.startswith("#") or not line.strip():
                continue
            cells = line.rstrip("\n").split("\t")
            if column >= len(cells):
                continue
            yield from (cells[column].split("|") if split_bar else [cells[column]])


def build(data_dir, lexicon_dir):
    table = {}

    def add(name, flag):
        name = name.strip()
        if len(name) < 2 or any(c.isspace() for c in name) or any(c.isdigit() for c in name):
            return
        w = fx.lower(name)
        if flag not in table.get(w, ""):
            table[w] = table.get(w, "") + flag

    langs = os.path.join(lexicon_dir, "Languages")
    for p in sorted(glob.glob(os.path.join(langs, "*", "first-names.tsv"))):
        for n in _names(p, 0): add(n, "F")
    for p in sorted(glob.glob(os.path.join(langs, "*", "surnames.tsv"))):
        for n in _names(p, 0): add(n, "S")
    with open(os.path.join(data_dir, "gazetteer", "geonames-cities15000.txt"), encoding="utf-8") as fh:
        for line in fh:
            c = line.rstrip("\n").split("\t")
            for n in [c[1], c[2]] + [a for a in c[3].split(",") if a]:
                add(n, "P")
    for n in _names(os.path.join(lexicon_dir, "camps-and-ghettos.tsv"), 6, True): add(n, "P")
    for n in _names(os.path.join(lexicon_dir, "territories.tsv"), 1, True): add(n, "R")
    for n in _names(os.path.join(lexicon_dir, "regions.tsv"), 2, True): add(n, "R")
    for n in _names(os.path.join(lexicon_dir, "historical-regions.tsv"), 5, True): add(n, "R")
    for kind in ("language-names.tsv", "nationalities.tsv", "peoples.tsv"):
        for p in sorted(glob.glob(os.path.join(langs, "*", kind))):
            for n in _names(p, 0): add(n, "N")
    return {w: "".join(f for f in FLAGS if f in flags) for w, flags in table.items()}


def write(table, path):
    """Sorted by ordinal code point order, gzip without a timestamp: byte-identical reruns."""
    body = "".join(f"{w}\t{table[w]}\n" for w in sorted(table)).encode("utf-8")
    with open(path, "wb") as raw, gzip.GzipFile(filename="", mode="wb", fileobj=raw, mtime=0) as gz:
        gz.write(body)


def read(path):
    with gzip.open(path, "rt", encoding="utf-8") as fh:
        return dict(line.rstrip("\n").split("\t") for line in fh)
