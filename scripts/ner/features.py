"""Word features, defined exactly as src/SwitchTag.Tagging/WordFeatures.cs computes them.

Per word, FEATURE_SLOTS hashed ids into one table of HASH_ROWS rows (row 0 = padding):
  id(s) = 1 + FNV-1a-32(UTF-8(s)) mod (HASH_ROWS - 1)
  slot 0  "w:" + lower(word)          slot 1  "W:" + word
  slots 2-4  "p2:"/"p3:"/"p4:" + first 2/3/4 code points of lower(word)
  slots 5-7  "s2:"/"s3:"/"s4:" + last 2/3/4 code points of lower(word)
  slot 8  "sh:" + shape(word)         slot 9  "c:" + case class + ("^" if sentence-initial)
  slots 10-19  "3:" + trigram of "<" + lower(word) + ">", the first 5 and last 5 when more than 10
  slot 20 "lex:" + the name-list flags of lower(word) (lexicon.py; "lex:" alone when it is in none)
and PIECE_SLOTS SentencePiece ids (+1, 0 = padding) of lower(word): all when at most 4, else the
first 3 and the last one. lower() maps each BMP code point through its single-code-point lowercase
(code points whose lowercase is longer, and non-BMP code points, stay as they are)."""
import unicodedata

HASH_ROWS = 1 << 17
FEATURE_SLOTS = 21
PIECE_SLOTS = 4
GROUPS = {"char": list(range(2, 8)) + list(range(10, 20)), "shape": [1, 8, 9], "lexicon": [20]}
SENTENCE_OPENERS = {".", "!", "?", "…", ":", ";", "\"", "“", "”", "„", "«", "»", "(", "-", "–", "—"}


def fnv1a(s):
    h = 0x811C9DC5
    for b in s.encode("utf-8"):
        h = ((h ^ b) * 0x01000193) & 0xFFFFFFFF
    return h


def fid(s):
    return 1 + fnv1a(s) % (HASH_ROWS - 1)


def lower(word):
    out = []
    for c in word:
        if ord(c) < 0x10000:
            l = c.lower()
            out.append(l if len(l) == 1 else c)
        else:
            out.append(c)
    return "".join(out)


def shape(word):
    out = []
    for c in word:
        cat = unicodedata.category(c)
        k = "X" if cat == "Lu" else "x" if cat == "Ll" else "d" if cat == "Nd" else "L" if cat[0] == "L" else c
        if len(out) >= 2 and out[-1] == k and out[-2] == k:
            continue
        out.append(k)
        if len(out) == 10:
            break
    return "".join(out)


def case_class(word):
    cats = [unicodedata.category(c) for c in word]
    letters = [c for c in cats if c[0] == "L"]
    if not letters:
        return "num" if "Nd" in cats else "none"
    up = sum(1 for c in letters if c == "Lu")
    lo = sum(1 for c in letters if c == "Ll")
    if up == 0:
        return "lower" if lo else "uncased"
    if lo == 0:
        return "upper1" if up == 1 else "upper"
    if letters[0] == "Lu" and up == 1:
        return "title"
    return "mixed"


def feature_ids(word, first, lexicon):
    lw = lower(word)
    ids = [fid("w:" + lw), fid("W:" + word)]
    ids += [fid("p%d:" % k + lw[:k]) for k in (2, 3, 4)]
    ids += [fid("s%d:" % k + lw[-k:]) for k in (2, 3, 4)]
    ids.append(fid("sh:" + shape(word)))
    ids.append(fid("c:" + case_class(word) + ("^" if first else "")))
    padded = "<" + lw + ">"
    tri = [padded[i:i + 3] for i in range(len(padded) - 2)]
    if len(tri) > 10:
        tri = tri[:5] + tri[-5:]
    ids += [fid("3:" + t) for t in tri]
    ids += [0] * (FEATURE_SLOTS - 1 - len(ids))
    ids.append(fid("lex:" + lexicon.get(lw, "")))
    return ids


def piece_ids(sp, word):
    p = sp.encode(lower(word))
    if len(p) > PIECE_SLOTS:
        p = p[:PIECE_SLOTS - 1] + p[-1:]
    p = [i + 1 for i in p]
    return p + [0] * (PIECE_SLOTS - len(p))


def is_first(words, i):
    return i == 0 or words[i - 1] in SENTENCE_OPENERS
