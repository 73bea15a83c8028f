# Export pROC's bundled aSAH data set (Turck et al. 2010, via Robin et al. 2011, BMC
# Bioinformatics 12:77) to a CSV fixture, with pROC's own AUCs, DeLong variances and
# paired DeLong tests on it. Run: Rscript asah_export.R  (writes ../fixtures/asah*.{csv,json})
suppressPackageStartupMessages({ library(pROC); library(jsonlite) })
here <- dirname(normalizePath(sub("--file=", "", grep("--file=", commandArgs(FALSE), value = TRUE))))
out_dir <- file.path(here, "..", "fixtures")
data(aSAH)
d <- data.frame(outcome = as.integer(aSAH$outcome == "Poor"), s100b = aSAH$s100b,
                ndka = aSAH$ndka, wfns = as.integer(aSAH$wfns))
write.csv(d, file.path(out_dir, "asah.csv"), row.names = FALSE, quote = FALSE)
mk <- function(x) roc(d$outcome, x, levels = c(0, 1), direction = "<", quiet = TRUE)
markers <- c("s100b", "ndka", "wfns")
rocs <- lapply(markers, function(m) mk(d[[m]])); names(rocs) <- markers
single <- lapply(markers, function(m) list(marker = m, auc = as.numeric(auc(rocs[[m]])),
  var = as.numeric(var(rocs[[m]], method = "delong"))))
pairs <- list(c("s100b", "ndka"), c("s100b", "wfns"), c("ndka", "wfns"))
paired <- lapply(pairs, function(p) {
  t <- roc.test(rocs[[p[1]]], rocs[[p[2]]], method = "delong", paired = TRUE)
  list(first = p[1], second = p[2], z = as.numeric(t$statistic), p = as.numeric(t$p.value))
})
calls <- c(
  'roc(outcome, marker, levels = c(0, 1), direction = "<", quiet = TRUE)',
  'auc(r); var(r, method = "delong")',
  'roc.test(r1, r2, method = "delong", paired = TRUE)  # statistic Z = (auc1 - auc2) / se')
res <- list(source = "pROC::aSAH (Turck et al. 2010), outcome Poor = 1; wfns as integer grade",
            r_version = R.version.string, proc_version = as.character(packageVersion("pROC")),
            calls = calls, single = single, paired = paired)
writeLines(toJSON(res, auto_unbox = TRUE, digits = NA, pretty = TRUE), file.path(out_dir, "asah-proc.json"))
cat("wrote asah.csv and asah-proc.json\n")
