"""Readers for the shared NER corpora. Every reader yields (words, tags) sentences with tags in
IOB2 over PER/LOC/ORG only (other types become O)."""
import glob
import os
import re

KEEP = {"PER", "LOC", "ORG"}


def clean_iob2(tags):
    """Map types outside PER/LOC/ORG to O and repair I- tags that do not continue a same-type
    entity (IOB1 and stray I- tags start a new entity, as conlleval reads them)."""
    out = []
    prev = "O"
    for t in tags:
        if t == "O" or "-" not in t:
            out.append("O"); prev = "O"; continue
        bio, typ = t.split("-", 1)
        typ = {"PERSON": "PER", "LOCATION": "LOC", "ORGANIZATION": "ORG"}.get(typ.upper(), typ.upper())
        if typ not in KEEP:
            out.append("O"); prev = "O"; continue
        if bio == "I" and prev not in ("B-" + typ, "I-" + typ):
            bio = "B"
        tag = bio + "-" + typ
        out.append(tag); prev = tag
    return out


def read_uner(path):
    """Universal NER IOB2: '#' comments, then index, token, tag, two annotator columns."""
    sents, words, tags = [], [], []
    with open(path, encoding="utf-8") as f:
        for line in f:
            line = line.rstrip("\n")
            if not line.strip():
                if words: sents.append((words, clean_iob2(tags)))
                words, tags = [], []
                continue
            if line.startswith("#"):
                continue
            cols = line.split("\t")
            if "-" in cols[0] or "." in cols[0]:
                continue
            words.append(cols[1]); tags.append(cols[2])
    if words: sents.append((words, clean_iob2(tags)))
    return sents


def read_conllup(path):
    """NerKor CoNLL-U Plus: the '# global.columns' header names the columns; NER is CONLL:NER."""
    sents, words, tags = [], [], []
    form_col, ner_col = 0, None
    with open(path, encoding="utf-8") as f:
        for line in f:
            line = line.rstrip("\n")
            if line.startswith("# global.columns"):
                names = line.split("=", 1)[1].split()
                form_col, ner_col = names.index("FORM"), names.index("CONLL:NER")
                continue
            if line.startswith("#"):
                continue
            if not line.strip():
                if words: sents.append((words, clean_iob2(tags)))
                words, tags = [], []
                continue
            cols = line.split("\t")
            words.append(cols[form_col]); tags.append(cols[ner_col])
    if words: sents.append((words, clean_iob2(tags)))
    return sents


GUM_TYPES = {"person": "PER", "place": "LOC", "organization": "ORG"}
_OPEN = re.compile(r"\((\d+)-([a-z]+)-([^()|]*)")
_CLOSE = re.compile(r"(\d+)\)")


def read_gum(path, stats):
    """GUM CoNLL-U with MISC Entity brackets. A person/place/organization mention is kept as a name
    when it carries a Wikipedia identity (the last '-' field of the bracket is not a coref-type
    keyword) or all its tokens are PROPN; names nested inside a kept name are dropped, the outermost
    kept name wins."""
    sents = []
    rows = []

    def flush():
        if not rows: return
        words = [r[0] for r in rows]
        tags = ["O"] * len(words)
        spans = []
        stack = {}
        for i, (_, upos, misc) in enumerate(rows):
            ent = next((m[len("Entity="):] for m in misc.split("|") if m.startswith("Entity=")), "")
            pos = 0
            while pos < len(ent):
                mo = _OPEN.match(ent, pos)
                if mo:
                    eid, etype, rest = mo.group(1), mo.group(2), mo.group(3)
                    stack.setdefault(eid, []).append((i, etype, rest))
                    pos = mo.end()
                    if pos < len(ent) and ent[pos] == ")":
                        s, et, rs = stack[eid].pop(); spans.append((s, i, et, rs)); pos += 1
                    continue
                mc = _CLOSE.match(ent, pos)
                if mc and stack.get(mc.group(1)):
                    s, et, rs = stack[mc.group(1)].pop(); spans.append((s, i, et, rs)); pos = mc.end(); continue
                pos += 1
        kept = []
        for s, e, et, rest in spans:
            if et not in GUM_TYPES: continue
            stats["mentions"] += 1
            fields = rest.split("-")
            has_wiki = len(fields) >= 6 and fields[-1] not in ("", "coref", "sgl", "ana", "cata", "pred", "appos", "bridge", "disc")
            all_propn = all(rows[k][1] == "PROPN" for k in range(s, e + 1))
            if has_wiki or all_propn:
                kept.append((s, e, GUM_TYPES[et]))
        kept.sort(key=lambda x: (x[0], -(x[1] - x[0])))
        taken = [False] * len(words)
        for s, e, lab in kept:
            if any(taken[s:e + 1]): continue
            # A name mention keeps only its proper-noun core: leading and trailing non-name tokens of a
            # wiki-linked mention ("the poet Byron", possessive "'s") are not part of the name.
            while s <= e and rows[s][1] != "PROPN" and not words[s][:1].isupper(): s += 1
            while e >= s and rows[e][1] != "PROPN" and not words[e][:1].isupper(): e -= 1
            if s > e: continue
            stats["kept"] += 1
            for k in range(s, e + 1): taken[k] = True
            tags[s] = "B-" + lab
            for k in range(s + 1, e + 1): tags[k] = "I-" + lab
        sents.append((words, tags))
        rows.clear()

    with open(path, encoding="utf-8") as f:
        for line in f:
            line = line.rstrip("\n")
            if not line.strip():
                flush(); continue
            if line.startswith("#"): continue
            cols = line.split("\t")
            if "-" in cols[0] or "." in cols[0]: continue
            rows.append((cols[1], cols[3], cols[9]))
    flush()
    return sents


def read_columns(path, sep=None):
    """Token-first, tag-last files (WikiGold IOB1 space-separated, BTC IOB2 tab-separated)."""
    sents, words, tags = [], [], []
    with open(path, encoding="utf-8") as f:
        for line in f:
            line = line.rstrip("\n")
            if not line.strip():
                if words: sents.append((words, clean_iob2(tags)))
                words, tags = [], []
                continue
            if line.startswith("-DOCSTART-"): continue
            cols = line.split(sep) if sep else line.split()
            if len(cols) < 2: continue
            words.append(cols[0]); tags.append(cols[-1])
    if words: sents.append((words, clean_iob2(tags)))
    return sents


WNUT_TYPES = {"person": "PER", "location": "LOC", "corporation": "ORG", "group": "ORG"}


def read_wnut(path):
    """WNUT-17 token<TAB>tag IOB2 (dev file starts with a BOM; some lines carry trailing spaces):
    person/location become PER/LOC, corporation and group (teams, bands, parties) ORG, the rest O."""
    sents, words, tags = [], [], []
    with open(path, encoding="utf-8-sig") as f:
        for line in f:
            cols = line.rstrip("\n").split("\t")
            if not line.strip():
                if words: sents.append((words, clean_iob2(tags)))
                words, tags = [], []
                continue
            tag = cols[-1].strip()
            typ = WNUT_TYPES.get(tag[2:]) if tag != "O" else None
            words.append(cols[0].strip()); tags.append(tag[:2] + typ if typ else "O")
    if words: sents.append((words, clean_iob2(tags)))
    return sents


def load_all(data_root):
    """Returns {split: {dataset: sentences}} with split in train/dev/test. English-EWT has no
    train file: its dev file is trained on (documented in models/ner.md) and it is selected on
    the other datasets' dev files."""
    out = {"train": {}, "dev": {}, "test": {}}
    for tb in sorted(glob.glob(os.path.join(data_root, "ner/uner/*/"))):
        name = os.path.basename(tb.rstrip("/"))
        for f in glob.glob(os.path.join(tb, "*.iob2")):
            split = "train" if "-train" in f else "dev" if "-dev" in f else "test"
            if name == "English-EWT" and split == "dev":
                split = "train"
            out[split][name] = read_uner(f)
    for split, folder in (("train", "train"), ("dev", "devel"), ("test", "test")):
        sents = []
        for f in sorted(glob.glob(os.path.join(data_root, "ner/nerkor/data", folder, "*/*.conllup"))):
            sents += read_conllup(f)
        out[split]["NerKor"] = sents
    stats = {"mentions": 0, "kept": 0}
    gum = []
    for f in sorted(glob.glob(os.path.join(data_root, "ner-extra/gum/*.conllu"))):
        gum += read_gum(f, stats)
    out["train"]["GUM"] = gum
    out["train"]["WikiGold"] = read_columns(os.path.join(data_root, "ner-extra/wikigold/wikigold.conll.txt"))
    out["train"]["BTC"] = read_columns(os.path.join(data_root, "ner-extra/btc/btc.train"), "\t")
    # WNUT-17 train and dev are trained on (English web text, like EWT); its test file is never read.
    out["train"]["WNUT17"] = [s for f in ("wnut17train.conll", "emerging.dev.conll")
                              for s in read_wnut(os.path.join(data_root, "ner-extra/wnut17", f))]
    return out, stats
