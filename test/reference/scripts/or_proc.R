# DeLong covariances of every pair of reader-by-modality AUCs with R pROC, for the check of
# Heed's Obuchowski-Rockette analysis with covariance "delong"
# (test/reference/obuchowski-rockette-proc.test.ts).
# Run from the repository root: Rscript test/reference/scripts/or_proc.R
# Input: test/reference/fixtures/or-scores-b.json (seeded invented scores, 2 modalities x 3 readers
# x 25 cases, written by or_numpy.py). Output: test/reference/fixtures/or-proc-delong.json with
# var(roc, method = "delong") on the diagonal and cov(roc_a, roc_b, method = "delong") (paired:
# the same cases) off it, in the order modality 0 readers 1..r, then modality 1 readers 1..r.
# Every ROC is built with levels = c(0, 1) and direction = "<" so pROC never flips a curve.
suppressPackageStartupMessages({ library(pROC); library(jsonlite) })
input <- fromJSON("test/reference/fixtures/or-scores-b.json", simplifyVector = FALSE)
truth <- unlist(input$truth)
curves <- list()
for (m in input$scores) for (reader in m) {
  curves[[length(curves) + 1]] <- roc(response = truth, predictor = unlist(reader), levels = c(0, 1), direction = "<", quiet = TRUE)
}
k <- length(curves)
S <- matrix(0, k, k)
for (a in seq_len(k)) for (b in seq_len(k)) {
  S[a, b] <- if (a == b) var(curves[[a]], method = "delong") else cov(curves[[a]], curves[[b]], method = "delong")
}
out <- list(
  generated_by = "test/reference/scripts/or_proc.R",
  input = "or-scores-b.json",
  r_version = R.version.string, proc_version = as.character(packageVersion("pROC")),
  calls = "roc(response, predictor, levels = c(0, 1), direction = '<'); var(roc, method = 'delong'); cov(roc_a, roc_b, method = 'delong')",
  auc = sapply(curves, function(x) as.numeric(auc(x))),
  covariance = lapply(seq_len(k), function(a) S[a, ]))
writeLines(toJSON(out, auto_unbox = TRUE, digits = NA), "test/reference/fixtures/or-proc-delong.json")
cat("wrote test/reference/fixtures/or-proc-delong.json\n")
