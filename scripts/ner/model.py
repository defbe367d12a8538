"""Word-level tagger: summed hashed-feature and subword-piece embeddings, a residual dilated CNN,
per-word BIO logits. Padding words (feature slot 0 = 0) are masked after every layer so a word's
logits never depend on how much padding its batch carries."""
import torch
import torch.nn as nn
import torch.nn.functional as F

LABELS = ["O", "B-PER", "I-PER", "B-LOC", "I-LOC", "B-ORG", "I-ORG"]


class Tagger(nn.Module):
    def __init__(self, hash_rows, piece_rows, dim=96, dilations=(1, 2, 4, 1), dropout=0.25):
        super().__init__()
        # Sparse gradients: an optimizer step touches only the table rows of the batch's words
        # (train.py pairs them with SparseAdam), which keeps large tables cheap to train.
        self.hash = nn.Embedding(hash_rows, dim, padding_idx=0, sparse=True)
        self.piece = nn.Embedding(piece_rows, dim, padding_idx=0, sparse=True)
        nn.init.normal_(self.hash.weight, std=0.1); nn.init.normal_(self.piece.weight, std=0.1)
        with torch.no_grad():
            self.hash.weight[0].zero_(); self.piece.weight[0].zero_()
        self.norm = nn.LayerNorm(dim)
        self.convs = nn.ModuleList(nn.Conv1d(dim, dim, 3, padding=d, dilation=d) for d in dilations)
        self.norms = nn.ModuleList(nn.LayerNorm(dim) for _ in dilations)
        self.drop = nn.Dropout(dropout)
        self.out = nn.Linear(dim, len(LABELS))
        self.half_tables = False

    def embed(self, table, ids):
        if self.half_tables:
            return F.embedding(ids, table.weight.half()).float().sum(2)
        return F.embedding(ids, table.weight, sparse=table.sparse).sum(2)

    def encode(self, features, pieces):
        """Per-word hidden states before the output layer (pretrain.py puts its own head on them)."""
        mask = (features[:, :, 0] > 0).unsqueeze(-1).float()
        x = self.embed(self.hash, features) + self.embed(self.piece, pieces)
        x = self.drop(self.norm(x)) * mask
        for conv, norm in zip(self.convs, self.norms):
            y = F.relu(conv(x.transpose(1, 2))).transpose(1, 2)
            x = norm(x + self.drop(y)) * mask
        return x

    def forward(self, features, pieces):
        return self.out(self.encode(features, pieces))
