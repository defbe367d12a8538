"""Trains the multilingual PER/LOC/ORG tagger and writes models/ner.* (see models/ner.md).
Deterministic: fixed seeds, one thread, data order from a seeded generator."""
import argparse
import json
import os
import random
import time
from collections import Counter

import numpy as np
import sentencepiece as spm
import torch

import corpora
import features as fx
import lexicon as lx
import pretrain as pt
from model import LABELS, Tagger

SEED = 20261201
LABEL_ID = {l: i for i, l in enumerate(LABELS)}


def allowed_transitions():
    """allowed[i, j]: tag j may follow tag i (IOB2: I-X only after B-X or I-X)."""
    n = len(LABELS)
    a = np.ones((n, n), dtype=bool)
    for j, l in enumerate(LABELS):
        if l.startswith("I-"):
            for i, p in enumerate(LABELS):
                a[i, j] = p[2:] == l[2:] and p != "O"
    start = np.array([not l.startswith("I-") for l in LABELS])
    return a, start


ALLOWED, START = allowed_transitions()


def viterbi(logits):
    """Best tag path under the IOB2 constraints, scored by log-softmax (same rule as the C# decoder)."""
    lp = logits - np.log(np.exp(logits - logits.max(1, keepdims=True)).sum(1, keepdims=True)) - logits.max(1, keepdims=True)
    trans = np.where(ALLOWED, 0.0, -1e9)
    score = lp[0] + np.where(START, 0.0, -1e9)
    back = []
    for t in range(1, len(lp)):
        cand = score[:, None] + trans
        back.append(cand.argmax(0))
        score = cand.max(0) + lp[t]
    best = [int(score.argmax())]
    for b in reversed(back):
        best.append(int(b[best[-1]]))
    return [LABELS[i] for i in reversed(best)]


def spans(tags):
    out, start, typ = set(), None, None
    for i, t in enumerate(tags + ["O"]):
        if t == "O" or t.startswith("B-") or (t.startswith("I-") and t[2:] != typ):
            if start is not None: out.add((start, i, typ))
            start, typ = (i, t[2:]) if t != "O" else (None, None)
    return out


def prf(gold_pred):
    tp = fp = fn = 0
    for g, p in gold_pred:
        gs, ps = spans(g), spans(p)
        tp += len(gs & ps); fp += len(ps - gs); fn += len(gs - ps)
    p = tp / (tp + fp) if tp + fp else 0.0
    r = tp / (tp + fn) if tp + fn else 0.0
    return 2 * p * r / (p + r) if p + r else 0.0


class Featurizer:
    def __init__(self, sp, lexicon, drop_groups=()):
        self.sp, self.lexicon, self.cache = sp, lexicon, {}
        self.zero = [s for g in drop_groups if g != "pieces" for s in fx.GROUPS[g]]
        self.no_pieces = "pieces" in drop_groups

    def word(self, w, first):
        key = (w, first)
        v = self.cache.get(key)
        if v is None:
            f = fx.feature_ids(w, first, self.lexicon)
            for s in self.zero: f[s] = 0
            p = [0] * fx.PIECE_SLOTS if self.no_pieces else fx.piece_ids(self.sp, w)
            v = self.cache[key] = (f, p)
        return v

    def sentence(self, words):
        fs, ps = zip(*(self.word(w, fx.is_first(words, i)) for i, w in enumerate(words)))
        return list(fs), list(ps)


UNKNOWN_WORD = fx.fid("w:")  # the "w:" feature of an empty word, which no real word has


def drop_table(sents, p, k):
    """Per-word dropout probability, indexed by the word's "w:" feature id: p for words seen at most
    k times in training, falling as k/count above that, so frequent words ("she", "her") keep their
    identity and only rare ones (most names) teach the tagger to work from affixes and context."""
    counts = Counter(fx.lower(w) for ws, _ in sents for w in ws)
    table = np.full(fx.HASH_ROWS, p, dtype=np.float64)
    for w, c in counts.items():
        if c > k:
            table[fx.fid("w:" + w)] = p * k / c
    table[0] = 0.0
    return torch.from_numpy(table)


def drop_words(rng, f, table):
    """Word dropout: a word's identity features (slots 0 and 1) are replaced by an unknown-word id
    with the probability drop_table gives its lower-cased form."""
    drop = torch.from_numpy(rng.random(f.shape[:2])) < table[f[:, :, 0]]
    f = f.clone()
    f[:, :, 0][drop] = UNKNOWN_WORD
    f[:, :, 1][drop] = 0
    return f


def batch_tensors(featurizer, sents):
    T = max(len(w) for w, _ in sents)
    F_ = np.zeros((len(sents), T, fx.FEATURE_SLOTS), dtype=np.int64)
    P_ = np.zeros((len(sents), T, fx.PIECE_SLOTS), dtype=np.int64)
    Y = np.full((len(sents), T), -100, dtype=np.int64)
    for b, (words, tags) in enumerate(sents):
        f, p = featurizer.sentence(words)
        F_[b, :len(words)] = f; P_[b, :len(words)] = p
        if tags is not None:
            Y[b, :len(words)] = [LABEL_ID[t] for t in tags]
    return torch.from_numpy(F_), torch.from_numpy(P_), torch.from_numpy(Y)


def predict(model, featurizer, sents, bs=64):
    model.eval()
    out = []
    order = sorted(range(len(sents)), key=lambda i: len(sents[i][0]))
    res = [None] * len(sents)
    with torch.no_grad():
        for k in range(0, len(order), bs):
            idx = order[k:k + bs]
            f, p, _ = batch_tensors(featurizer, [(sents[i][0], None) for i in idx])
            logits = model(f, p).numpy()
            for j, i in enumerate(idx):
                res[i] = viterbi(logits[j, :len(sents[i][0])])
    return res


def augment(rng, words, lower_share):
    r = rng.random()
    if r < lower_share: return [fx.lower(w) for w in words]
    if r < lower_share + 0.05: return [w.upper() for w in words]
    return words


def sample_plan(train, alpha, budget, max_repeat, weights=corpora.SAMPLING_WEIGHT):
    """Tokens each training set contributes per epoch: temperature sampling over sets,
    share_s ~ weight_s * tokens_s ** alpha (alpha < 1 lifts small sets and holds large ones back),
    scaled to `budget` tokens, never more than max_repeat passes over a set; silver or noisy sets
    (corpora.SAMPLING_WEIGHT) weigh half, English-EWT's train split twice (see there). Returns {name: sentences per epoch}."""
    tokens = {n: sum(len(w) for w, _ in s) for n, s in train.items()}
    weight = {n: weights.get(n, 1.0) * tokens[n] ** alpha for n in train}
    total = sum(weight.values())
    plan = {}
    for n, ss in train.items():
        want = min(budget * weight[n] / total, max_repeat * tokens[n])
        plan[n] = max(1, round(len(ss) * want / tokens[n]))
    return plan


def draw(rng, sents, k):
    """k sentences: whole passes over the set, then a seeded sample without replacement."""
    return sents * (k // len(sents)) + rng.sample(sents, k % len(sents))


def train_sp(data, path_prefix, per_set):
    """Pieces from the lower-cased training text, at most per_set sentences of each set (a seeded
    sample), so that no large set decides the vocabulary of the others' scripts and languages."""
    lines = []
    for name, sents in sorted(data["train"].items()):
        if len(sents) > per_set:
            sents = random.Random(f"{SEED}:{name}").sample(sents, per_set)
        lines += [" ".join(fx.lower(w) for w in ws) for ws, _ in sents]
    tmp = path_prefix + ".sp-input.txt"
    with open(tmp, "w", encoding="utf-8") as f:
        f.write("\n".join(lines))
    spm.SentencePieceTrainer.train(
        input=tmp, model_prefix=path_prefix, model_type="unigram", vocab_size=16000,
        character_coverage=0.9995, normalization_rule_name="identity", num_threads=1,
        shuffle_input_sentence=False, input_sentence_size=0, split_digits=True, seed_sentencepiece_size=200000,
        bos_id=-1, eos_id=-1, unk_id=0, pad_id=-1, minloglevel=2)
    os.remove(tmp)


def add_control_pieces(path):
    """Microsoft.ML.Tokenizers' unigram loader needs bos/eos pieces: append them as control pieces
    after the trained vocabulary, so every trained piece keeps its id."""
    from sentencepiece import sentencepiece_model_pb2 as pb
    m = pb.ModelProto()
    with open(path, "rb") as f:
        m.ParseFromString(f.read())
    if m.trainer_spec.bos_id >= 0:
        return
    n = len(m.pieces)
    for name in ("<s>", "</s>"):
        piece = m.pieces.add()
        piece.piece, piece.score, piece.type = name, 0.0, pb.ModelProto.SentencePiece.CONTROL
    m.trainer_spec.bos_id, m.trainer_spec.eos_id = n, n + 1
    with open(path, "wb") as f:
        f.write(m.SerializeToString())


PER_TAGS = [LABELS.index("B-PER"), LABELS.index("I-PER")]
LOC_TAGS = [LABELS.index("B-LOC"), LABELS.index("I-LOC")]


def per_as_loc_loss(logits, y):
    """Mean over gold person words of -log(1 - P(place tag)): an extra price on the one confusion
    the index must not make (a person shown as a place), on top of the cross-entropy."""
    flat, gold = logits.reshape(-1, len(LABELS)), y.reshape(-1)
    person = (gold == PER_TAGS[0]) | (gold == PER_TAGS[1])
    if not person.any():
        return logits.sum() * 0.0
    p_loc = torch.softmax(flat[person], dim=-1)[:, LOC_TAGS].sum(-1)
    return -torch.log1p(-p_loc.clamp(max=1 - 1e-6)).mean()


def run(args, data, sp, lexicon, drop_groups, dim, dilations, epochs, log):
    torch.manual_seed(SEED); random.seed(SEED); np.random.seed(SEED)
    rng = random.Random(SEED)
    nrng = np.random.default_rng(SEED)
    feat = Featurizer(sp, lexicon, drop_groups)
    model = Tagger(fx.HASH_ROWS, sp.get_piece_size() + 1, dim, dilations)
    if args.pretrain_epochs:
        # The tables and convolutions start from masked-word pretraining; the output layer stays fresh.
        secs = pt.pretrain(args, model, feat, data, SEED, log, sample_plan, draw, augment, batch_tensors)
        log(f"pretraining {secs:.0f}s")
    tables = [model.hash.weight, model.piece.weight]
    opts = [torch.optim.SparseAdam(tables, lr=2e-3),
            torch.optim.Adam([p for p in model.parameters() if all(p is not t for t in tables)], lr=2e-3)]
    train = data["train"]
    budget = args.budget * (args.ablation_share if args.ablations else 1.0)
    plan = sample_plan(train, args.alpha, budget, args.max_repeat)
    dev = data["dev"]
    dropout_table = drop_table([s for ss in train.values() for s in ss], args.word_dropout, args.dropout_count)
    total_steps = epochs * (sum(plan.values()) // 32 + len(plan) + 1)
    scheds = [torch.optim.lr_scheduler.OneCycleLR(o, max_lr=2e-3, total_steps=total_steps + 10, pct_start=0.1) for o in opts]
    best, best_state, t0 = -1.0, None, time.time()
    for ep in range(epochs):
        model.train()
        sample = [s for n in sorted(train) for s in draw(rng, train[n], plan[n])]
        sample = [(augment(rng, w, args.lower_share), t) for w, t in sample]
        sample.sort(key=lambda s: len(s[0]))
        batches = [sample[i:i + 32] for i in range(0, len(sample), 32)]
        rng.shuffle(batches)
        loss_sum = 0.0
        for bi, b in enumerate(batches):
            f, p, y = batch_tensors(feat, b)
            logits = model(drop_words(nrng, f, dropout_table), p)
            loss = torch.nn.functional.cross_entropy(logits.reshape(-1, len(LABELS)), y.reshape(-1), ignore_index=-100)
            if args.per_loc_penalty > 0:
                loss = loss + args.per_loc_penalty * per_as_loc_loss(logits, y)
            for o in opts: o.zero_grad()
            loss.backward()
            for o, sc in zip(opts, scheds): o.step(); sc.step()
            loss_sum += loss.item()
            if (bi + 1) % 1000 == 0:
                log(f"  epoch {ep + 1} batch {bi + 1}/{len(batches)} loss {loss_sum / (bi + 1):.4f} [{time.time() - t0:.0f}s]")
        scores = {n: prf(zip([t for _, t in s], predict(model, feat, s))) for n, s in sorted(dev.items())}
        mean = sum(scores.values()) / len(scores)
        log(f"epoch {ep + 1} loss {loss_sum / len(batches):.4f} dev mean F1 {mean:.4f} "
            + " ".join(f"{n}={v:.3f}" for n, v in scores.items()) + f" [{time.time() - t0:.0f}s]")
        if mean > best:
            best, best_state = mean, {k: v.clone() for k, v in model.state_dict().items()}
    model.load_state_dict(best_state)
    return model, feat, best, time.time() - t0


def export(model, feat, sp, out_dir, log):
    model.eval(); model.half_tables = True
    with torch.no_grad():
        model.hash.weight.copy_(model.hash.weight.half().float())
        model.piece.weight.copy_(model.piece.weight.half().float())
    sents = [
        "Maria Kowalska moved from Kraków to Chicago in 1968 .".split(),
        "Then I worked for General Motors , you know , in Detroit".split(),
        "JA SAM ROĐEN U SARAJEVU , A MOJA MAJKA U MOSTARU".split(),
        "Budapestről jöttünk , Nagy Imre idején".split(),
        "我 的 祖母 住 在 北京".split(),
        "Wir sind 1942 von Wien nach Theresienstadt gekommen , sagte Frau Löwy .".split(),
        "Мы жили в Москве у Ивана Петровича до войны".split(),
        "מיר זײַנען געקומען קיין ווילנע מיט משה ראָזענבערג".split(),
        "émigré O'Connor's co-op ... Москва !".split(),
        ["x"],
    ]
    f, p, _ = batch_tensors(feat, [(s, None) for s in sents])
    with torch.no_grad():
        logits = model(f, p).numpy()
    onnx_path = os.path.join(out_dir, "ner.onnx")
    torch.onnx.export(model, (f, p), onnx_path, input_names=["features", "pieces"], output_names=["logits"],
                      dynamic_axes={"features": {0: "batch", 1: "words"}, "pieces": {0: "batch", 1: "words"},
                                    "logits": {0: "batch", 1: "words"}}, opset_version=13)
    fixture = {"source": "scripts/ner/train.py export(): PyTorch logits of the exported weights",
               "sentences": [{"words": s, "features": f[i, :len(s)].tolist(), "pieces": p[i, :len(s)].tolist(),
                              "logits": logits[i, :len(s)].tolist()} for i, s in enumerate(sents)]}
    with open(os.path.join(out_dir, "ner.parity.json"), "w", encoding="utf-8") as fh:
        json.dump(fixture, fh, ensure_ascii=False)
    with open(os.path.join(out_dir, "ner.labels.json"), "w", encoding="utf-8") as fh:
        json.dump({"labels": LABELS, "hashRows": fx.HASH_ROWS, "featureSlots": fx.FEATURE_SLOTS,
                   "pieceSlots": fx.PIECE_SLOTS, "pieceModel": "ner.spm", "lexicon": "ner.lexicon.tsv.gz"}, fh, indent=1)
    log(f"exported {onnx_path} ({os.path.getsize(onnx_path) / 1e6:.1f} MB)")


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--data", default="../shared/data")
    ap.add_argument("--out", default="models")
    ap.add_argument("--lists", default="models/lexicon", help="the shipped name lists (models/namelists.md) the name lexicon is built from")
    ap.add_argument("--epochs", type=int, default=12)
    ap.add_argument("--budget", type=float, default=1.9e6, help="training tokens per epoch (sample_plan)")
    ap.add_argument("--alpha", type=float, default=0.5, help="sampling temperature exponent over training sets")
    ap.add_argument("--max-repeat", type=float, default=3.0, help="most passes over one set per epoch")
    ap.add_argument("--sp-per-set", type=int, default=15000, help="sentences per set for the piece vocabulary")
    ap.add_argument("--splits-out", default="/tmp/switchtag-ner-test",
                    help="held-out test parts are written here as SOURCE/LANG-test.tsv for `switchtag eval ner`")
    ap.add_argument("--word-dropout", type=float, default=0.25)
    ap.add_argument("--lower-share", type=float, default=0.20, help="share of training sentences lower-cased each epoch (speech-recognition text is often lower case)")
    ap.add_argument("--dropout-count", type=int, default=50, help="words seen more often are dropped less")
    ap.add_argument("--dilations", default="1,2,4,8,1", help="receptive field = sum, at most the C# window overlap (16)")
    ap.add_argument("--per-loc-penalty", type=float, default=1.0,
                    help="weight of an extra loss on place tags given to gold person words (0: plain cross-entropy)")
    ap.add_argument("--pretrain-epochs", type=int, default=0, help="epochs of masked-word pretraining before tagging (pretrain.py)")
    ap.add_argument("--pretrain-budget", type=float, default=1.2e6, help="pretraining tokens per epoch")
    ap.add_argument("--pretrain-vocab", type=int, default=10000, help="most frequent lower-cased words the pretraining head predicts")
    ap.add_argument("--mask-share", type=float, default=0.15, help="share of words masked in pretraining")
    ap.add_argument("--threads", type=int, default=1)
    ap.add_argument("--ablations", action="store_true")
    ap.add_argument("--ablation-epochs", type=int, default=2)
    ap.add_argument("--ablation-share", type=float, default=0.4, help="share of the per-epoch token budget")
    args = ap.parse_args()
    torch.set_num_threads(args.threads)
    logf = open(os.path.join(args.out, "ner.ablations.log" if args.ablations else "ner.train.log"), "w", encoding="utf-8")

    def log(msg):
        print(msg, flush=True); logf.write(msg + "\n"); logf.flush()

    data, gum_stats = corpora.load_all(args.data)
    log(f"GUM person/place/organization mentions {gum_stats['mentions']}, kept as names {gum_stats['kept']}")
    for split in data:
        for n, s in sorted(data[split].items()):
            names = sum(t.startswith("B-") for _, ts in s for t in ts)
            log(f"{split} {n}: {len(s)} sentences, {sum(len(w) for w, _ in s)} tokens, {names} names")
    for n, s in sorted(data["test"].items()):
        corpora.write_split(s, os.path.join(args.splits_out, n + "-test.tsv"))
    log(f"test parts written to {args.splits_out}/SOURCE/LANG-test.tsv")
    plan = sample_plan(data["train"], args.alpha, args.budget, args.max_repeat)
    for n, k in sorted(plan.items()):
        ss = data["train"][n]
        log(f"sampling {n}: {k} of {len(ss)} sentences per epoch ({k / len(ss):.2f} passes, "
            f"~{round(k * sum(len(w) for w, _ in ss) / len(ss))} tokens)")
    sp_prefix = os.path.join(args.out, "ner")
    if not (args.ablations and os.path.exists(sp_prefix + ".spm")):  # ablations reuse the shipped pieces
        train_sp(data, sp_prefix, args.sp_per_set)
        os.replace(sp_prefix + ".model", sp_prefix + ".spm")
        os.remove(sp_prefix + ".vocab")
        add_control_pieces(sp_prefix + ".spm")
    sp = spm.SentencePieceProcessor(model_file=sp_prefix + ".spm")
    lexicon = lx.build(args.data, args.lists)
    counts = Counter(f for flags in lexicon.values() for f in flags)
    log(f"name lexicon: {len(lexicon)} words; " + " ".join(f"{f}={counts[f]}" for f in lx.FLAGS))
    if not args.ablations:
        lx.write(lexicon, os.path.join(args.out, "ner.lexicon.tsv.gz"))
    if args.ablations:
        variants = [("full", (), 96, (1, 2, 4, 1)), ("no subword pieces", ("pieces",), 96, (1, 2, 4, 1)),
                    ("no char n-grams/affixes", ("char",), 96, (1, 2, 4, 1)),
                    ("no shape/case features", ("shape",), 96, (1, 2, 4, 1)),
                    ("no name lexicon", ("lexicon",), 96, (1, 2, 4, 1)),
                    ("smaller CNN (2 x 64)", (), 64, (1, 2))]
        rows = []
        for name, drop, dim, dil in variants:
            log(f"ablation: {name}")
            model, feat, best, secs = run(args, data, sp, lexicon, drop, dim, dil, args.ablation_epochs, log)
            rows.append((name, best, secs))
        with open(os.path.join(args.out, "ner.ablations.tsv"), "w", encoding="utf-8") as fh:
            fh.write("variant\tdev_mean_f1\ttrain_seconds\n")
            for name, best, secs in rows:
                fh.write(f"{name}\t{best:.4f}\t{secs:.0f}\n")
        return
    dilations = tuple(int(d) for d in args.dilations.split(","))
    assert sum(dilations) <= 16, "receptive field beyond the C# window overlap"
    log(f"dilations {dilations}, word dropout {args.word_dropout} (count > {args.dropout_count} scaled down), {args.epochs} epochs, "
        f"budget {args.budget:.0f} tokens/epoch, alpha {args.alpha}, max repeat {args.max_repeat}, hash rows {fx.HASH_ROWS}")
    model, feat, best, secs = run(args, data, sp, lexicon, (), 96, dilations, args.epochs, log)
    log(f"best dev mean F1 {best:.4f}, training {secs:.0f}s")
    export(model, feat, sp, args.out, log)
    for n, s in sorted(data["test"].items()):
        log(f"test {n}: F1 {prf(zip([t for _, t in s], predict(model, feat, s))):.4f} (PyTorch, Viterbi)")


if __name__ == "__main__":
    main()
