# DeLong AUC variance and paired DeLong tests with R pROC, for the reference fixtures.
# Called by make_fixtures.py: Rscript proc_delong.R IN.json OUT.json
# IN: {"single": [{"id", "truth": [0/1...], "score": [...]}],
#      "paired": [{"id", "truth", "score1", "score2"}]}
# Every ROC is built with levels = c(0, 1) and direction = "<" so pROC never flips a curve
# whose AUC is below 0.5 (its default direction = "auto" would).
suppressPackageStartupMessages({ library(pROC); library(jsonlite) })
args <- commandArgs(trailingOnly = TRUE)
input <- fromJSON(args[[1]], simplifyVector = TRUE)
mk <- function(truth, score) roc(response = truth, predictor = score, levels = c(0, 1), direction = "<", quiet = TRUE)
single <- lapply(seq_len(NROW(input$single)), function(i) {
  x <- input$single[i, ]
  r <- mk(unlist(x$truth), unlist(x$score))
  ci <- ci.auc(r, method = "delong")
  list(id = x$id, auc = as.numeric(auc(r)), var = as.numeric(var(r, method = "delong")),
       ci_lower = ci[[1]], ci_upper = ci[[3]])
})
paired <- lapply(seq_len(NROW(input$paired)), function(i) {
  x <- input$paired[i, ]
  truth <- unlist(x$truth)
  r1 <- mk(truth, unlist(x$score1))
  r2 <- mk(truth, unlist(x$score2))
  t <- roc.test(r1, r2, method = "delong", paired = TRUE)
  list(id = x$id, auc1 = as.numeric(auc(r1)), auc2 = as.numeric(auc(r2)),
       z = as.numeric(t$statistic), p = as.numeric(t$p.value))
})
out <- list(r_version = R.version.string, proc_version = as.character(packageVersion("pROC")),
            single = single, paired = paired)
writeLines(toJSON(out, auto_unbox = TRUE, digits = NA), args[[2]])
