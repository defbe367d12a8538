"""Readers for the shared NER corpora. Every reader yields (words, tags) sentences with tags in
IOB2 over PER/LOC/ORG only (other types become O)."""
import glob
import os
import random
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


def blocks_split(sents, name, shares, block=50):
    """A fixed split for a set that has none: the sentences are cut into blocks of `block`
    consecutive sentences (so a document's neighbouring sentences stay together), the block order
    is shuffled with a seed made from the set's name, and consecutive runs of that order take the
    given shares. Each part keeps the file order of its blocks."""
    blocks = [sents[i:i + block] for i in range(0, len(sents), block)]
    order = list(range(len(blocks)))
    random.Random(f"{SPLIT_SEED}:{name}").shuffle(order)
    parts, start, acc = [], 0, 0.0
    for share in shares:
        acc += share
        end = round(acc * len(blocks))
        parts.append([s for b in sorted(order[start:end]) for s in blocks[b]])
        start = end
    return parts


SPLIT_SEED = 20261202
UNER_LANG = {"Chinese-GSD": "zh", "Croatian-SET": "hr", "Danish-DDT": "da", "English-EWT": "en",
             "Portuguese-Bosque": "pt", "Serbian-SET": "sr", "Slovak-SNK": "sk", "Swedish-Talbanken": "sv"}
# Sampling weights beside the size-based share (train.py sample_plan): sets whose tags are silver
# (from Wikipedia links) or whose OCR text leaves names untagged weigh half; English-EWT's train
# split, the only in-domain English web text and an English target, weighs twice (about one pass
# per epoch instead of half of one).
SAMPLING_WEIGHT = {"WikiNER/ru": 0.5, "Europeana-LFT/de": 0.5, "Europeana-ONB/de": 0.5, "Europeana-KB/nl": 0.5,
                   "English-EWT/en": 2.0}
# EHRI-NER languages too small for a held-out part with any weight (under 200 names in all): trained on whole.
EHRI_TRAIN_ONLY = {"fr", "nl", "sk"}
SPLITS = {  # shares of train / dev / test of the sets split here (block_split, seed SPLIT_SEED)
    "GermEval2014/de": (0.45, 0.15, 0.40),   # of the GermEval test file; its dev file is all train
    "FactRuEval2016/ru": (0.8, 0.2),         # of the dev file; the test file is test
    "KPWr/pl": (0.5, 0.15, 0.35),            # of the only (test) file
    "MultiLeg": (0.9, 0.1),                  # of each train file; the test files are test
    "EHRI-NER": (0.7, 0.1, 0.2),             # of each language's file
}


def load_all(data_root):
    """Returns {split: {"source/lang": sentences}} with split in train/dev/test; sets without a
    split of their own are split by blocks_split as SPLITS says (documented in models/ner.md)."""
    out = {"train": {}, "dev": {}, "test": {}}
    extra = os.path.join(data_root, "ner-extra")

    def tsv(*parts):
        return read_columns(os.path.join(extra, *parts), "\t")

    def put(name, *parts):
        for split, sents in zip(("train", "dev", "test"), parts):
            if sents: out[split][name] = sents

    for tb in sorted(glob.glob(os.path.join(data_root, "ner/uner/*/"))):
        name = os.path.basename(tb.rstrip("/"))
        for f in glob.glob(os.path.join(tb, "*.iob2")):
            split = "train" if "-train" in f else "dev" if "-dev" in f else "test"
            out[split][f"{name}/{UNER_LANG[name]}"] = read_uner(f)
    for split, folder in (("train", "train"), ("dev", "devel"), ("test", "test")):
        sents = []
        for f in sorted(glob.glob(os.path.join(data_root, "ner/nerkor/data", folder, "*/*.conllup"))):
            sents += read_conllup(f)
        out[split]["NerKor/hu"] = sents
    stats = {"mentions": 0, "kept": 0}
    gum = []
    for f in sorted(glob.glob(os.path.join(extra, "gum/*.conllu"))):
        gum += read_gum(f, stats)
    out["train"]["GUM/en"] = gum
    out["train"]["WikiGold/en"] = read_columns(os.path.join(extra, "wikigold/wikigold.conll.txt"))
    out["train"]["BTC/en"] = read_columns(os.path.join(extra, "btc/btc.train"), "\t")
    # WNUT-17 train and dev are trained on (English web text, like EWT); its test file is never read.
    out["train"]["WNUT17/en"] = [s for f in ("wnut17train.conll", "emerging.dev.conll")
                                 for s in read_wnut(os.path.join(extra, "wnut17", f))]
    for code in ("nob", "nno"):
        put("NorNE/" + {"nob": "nb", "nno": "nn"}[code],
            *(tsv("norne", code, f"{code}-{s}.tsv") for s in ("train", "dev", "test")))
    g_train, g_dev, g_test = blocks_split(tsv("germeval2014", "germeval2014-test.tsv"), "GermEval2014/de", SPLITS["GermEval2014/de"])
    put("GermEval2014/de", tsv("germeval2014", "germeval2014-dev.tsv") + g_train, g_dev, g_test)
    put("Europeana-LFT/de", tsv("europeana-newspapers", "enp_DE.lft.tsv"))
    put("Europeana-ONB/de", tsv("europeana-newspapers", "enp_DE.onb.tsv"))
    put("Europeana-KB/nl", tsv("europeana-newspapers", "enp_NL.kb.tsv"))
    put("WikiNER/ru", tsv("wikiner-ru", "wikiner-ru-train.tsv"))
    f_train, f_dev = blocks_split(tsv("factrueval2016", "factrueval-dev.tsv"), "FactRuEval2016/ru", SPLITS["FactRuEval2016/ru"])
    put("FactRuEval2016/ru", f_train, f_dev, tsv("factrueval2016", "factrueval-test.tsv"))
    put("KPWr/pl", *blocks_split(tsv("kpwr", "kpwr-ner-n82-test.tsv"), "KPWr/pl", SPLITS["KPWr/pl"]))
    for lang in ("pl", "lv", "lt", "et"):
        name = "MultiLeg/" + lang
        m_train, m_dev = blocks_split(tsv("multileg", f"multileg-{lang}-train.tsv"), name, SPLITS["MultiLeg"])
        put(name, m_train, m_dev, tsv("multileg", f"multileg-{lang}-test.tsv"))
    for lang in ("cs", "de", "en", "fr", "hu", "nl", "pl", "sk", "yi"):
        name = "EHRI-NER/" + lang
        sents = tsv("ehri-ner", f"ehri_{lang}.tsv")
        put(name, *([sents] if lang in EHRI_TRAIN_ONLY else blocks_split(sents, name, SPLITS["EHRI-NER"])))
    return out, stats


def write_split(sents, path):
    """Writes sentences as token<TAB>tag lines (the format `switchtag eval ner` reads)."""
    os.makedirs(os.path.dirname(path), exist_ok=True)
    with open(path, "w", encoding="utf-8") as f:
        for words, tags in sents:
            f.write("".join(f"{w}\t{t}\n" for w, t in zip(words, tags)) + "\n")
