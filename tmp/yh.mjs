import yargs from 'yargs';
import { hideBin } from 'yargs/helpers';
