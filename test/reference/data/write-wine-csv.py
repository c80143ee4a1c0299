# Writes wine.csv: the wine recognition data as shipped with scikit-learn (sklearn.datasets.load_wine;
# UCI Machine Learning Repository, Forina et al.), 178 rows, 13 descriptors and the class 0/1/2.
# Run with Debian's interpreter: /usr/bin/python3 test/reference/data/write-wine-csv.py
import csv
import os
from sklearn.datasets import load_wine

data = load_wine()
path = os.path.join(os.path.dirname(os.path.abspath(__file__)), "wine.csv")
with open(path, "w", newline="") as handle:
    writer = csv.writer(handle)
    writer.writerow(list(data.feature_names) + ["class"])
    for row, label in zip(data.data, data.target):
        writer.writerow([repr(float(v)) for v in row] + [int(label)])
