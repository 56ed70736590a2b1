#!/usr/bin/env python3
"""Compares two weights.csv files of the same study (columns date,strategy,window,asset,weight):
prints, per strategy and window, the rebalance rows matched and the largest absolute weight
difference, and exits with status 1 when a difference exceeds the tolerance or when the two
files do not hold the same rebalances and assets.

    python3 bench/peer/agree.py PEER/weights.csv PRODUCT/weights.csv [--tolerance 1e-9]
"""

import argparse
import sys
from collections import defaultdict


def read_weights(path):
    """{(strategy, window): {(date, asset): weight}} with the dates of each path."""
    paths = defaultdict(dict)
    with open(path) as f:
        header = f.readline().strip()
        if header != "date,strategy,window,asset,weight":
            sys.exit(f"{path}: header '{header}' is not date,strategy,window,asset,weight")
        for number, line in enumerate(f, start=2):
            date, strategy, window, asset, weight = line.rstrip("\n").split(",")
            try:
                paths[(strategy, window)][(date, asset)] = float(weight)
            except ValueError:
                sys.exit(f"{path} line {number}: weight '{weight}' is not a number")
    return paths


def main(argv=None):
    p = argparse.ArgumentParser(description=__doc__.split("\n\n")[0])
    p.add_argument("peer", help="weights.csv of the numpy implementation")
    p.add_argument("product", help="weights.csv of sigmawalk on the same data and study")
    p.add_argument("--tolerance", type=float, default=1e-9, help="largest allowed |difference| (1e-9)")
    args = p.parse_args(argv)
    peer = read_weights(args.peer)
    product = read_weights(args.product)
    failed = False
    if set(peer) != set(product):
        print(f"paths differ: only in {args.peer}: {sorted(set(peer) - set(product))}; "
              f"only in {args.product}: {sorted(set(product) - set(peer))}")
        failed = True
    print(f"{'strategy':<16}{'window':>8}{'rebalances':>12}{'weights':>10}{'largest |difference|':>24}")
    for key in sorted(set(peer) & set(product), key=lambda k: (int(k[1]), k[0])):
        a, b = peer[key], product[key]
        if a.keys() != b.keys():
            only_a = sorted(a.keys() - b.keys())[:3]
            only_b = sorted(b.keys() - a.keys())[:3]
            print(f"{key[0]} {key[1]}: (date, asset) rows differ, e.g. only in peer {only_a}, "
                  f"only in product {only_b}")
            failed = True
        common = a.keys() & b.keys()
        worst = max((abs(a[k] - b[k]) for k in common), default=0.0)
        dates = {d for d, _ in common}
        flag = "" if worst <= args.tolerance else "   above tolerance"
        failed |= worst > args.tolerance
        print(f"{key[0]:<16}{key[1]:>8}{len(dates):>12}{len(common):>10}{worst:>24.3e}{flag}")
    print(f"tolerance {args.tolerance:g}: {'FAILED' if failed else 'agree'}")
    return 1 if failed else 0


if __name__ == "__main__":
    sys.exit(main())
